import { useState, type RefObject } from "react";
import { apiPaths } from "../../../../shared/schemas/api-paths";
import { Button, buttonClass } from "../../../components/ui/button";
import { toast } from "../../../lib/toast-store";
import { withShare } from "../api/map-queries";
import { downloadBlob, fileSlug, serializeFigure, svgToPng } from "../lib/export-figure";

interface ExportButtonsProps {
  mapId: string;
  title: string;
  layerLabel: string;
  figure: RefObject<SVGSVGElement | null>;
  share?: string;
}

/** Data through the API's export routes (settings embedded); the figure drawn here as SVG or PNG. */
export function ExportButtons({ mapId, title, layerLabel, figure, share }: ExportButtonsProps) {
  const [busy, setBusy] = useState(false);
  const name = `${fileSlug(title)}-${fileSlug(layerLabel)}`;
  const svgText = () => {
    if (!figure.current) throw new Error("The figure is not on screen yet");
    return serializeFigure(figure.current);
  };
  const saveSvg = () => downloadBlob(new Blob([svgText()], { type: "image/svg+xml" }), `${name}.svg`);
  const savePng = async () => {
    setBusy(true);
    try {
      const svg = figure.current!;
      downloadBlob(await svgToPng(svgText(), svg.width.baseVal.value, svg.height.baseVal.value), `${name}.png`);
    } catch (e) {
      toast.error(e instanceof Error ? e.message : "PNG export failed");
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="flex flex-wrap gap-2" role="group" aria-label="Export">
      <a className={buttonClass("secondary", "sm")} href={withShare(apiPaths.maps.exportCsv(mapId), share)} download={`${fileSlug(title)}.csv`}>
        Data CSV
      </a>
      <a className={buttonClass("secondary", "sm")} href={withShare(apiPaths.maps.exportJson(mapId), share)} download={`${fileSlug(title)}.json`}>
        Data JSON
      </a>
      <Button variant="secondary" size="sm" onClick={saveSvg}>
        Figure SVG
      </Button>
      <Button variant="secondary" size="sm" onClick={savePng} busy={busy}>
        Figure PNG
      </Button>
    </div>
  );
}
