/**
 * The map figure as a file. The figure is drawn with presentation attributes only (no CSS
 * classes), so a clone of its <svg> without the interactive overlays is the SVG as seen; the PNG
 * is that SVG drawn onto a canvas at twice the size.
 */

/** A file-name-safe slug of a title: "Leak sweep (N = 50)" → "leak-sweep-n-50". */
export function fileSlug(title: string): string {
  return (
    title
      .normalize("NFKD")
      .replace(/[^\w\s-]/g, "")
      .trim()
      .toLowerCase()
      .replace(/[\s_-]+/g, "-")
      .slice(0, 60) || "map"
  );
}

/** Standalone SVG text of a figure: interactive parts and accessibility hooks removed. */
export function serializeFigure(svg: SVGSVGElement): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  clone.querySelectorAll('[data-export="skip"]').forEach((n) => n.remove());
  clone.querySelectorAll("[tabindex]").forEach((n) => n.removeAttribute("tabindex"));
  clone.querySelectorAll("[role]").forEach((n) => n.removeAttribute("role"));
  clone.setAttribute("xmlns", "http://www.w3.org/2000/svg");
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(clone)}`;
}

/** Saves a blob under a file name through a temporary link. */
export function downloadBlob(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/**
 * Rasterises SVG text of the given size to a PNG blob at `scale`× (default 2). The SVG goes in
 * as a data: URL: the app's Content-Security-Policy allows images from data: but not blob:.
 */
export async function svgToPng(svgText: string, width: number, height: number, scale = 2): Promise<Blob> {
  const img = new Image();
  await new Promise<void>((resolve, reject) => {
    img.onload = () => resolve();
    img.onerror = () => reject(new Error("The figure could not be drawn as an image"));
    img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svgText)}`;
  });
  const canvas = document.createElement("canvas");
  canvas.width = Math.round(width * scale);
  canvas.height = Math.round(height * scale);
  const ctx = canvas.getContext("2d");
  if (!ctx) throw new Error("This browser cannot draw on a canvas");
  ctx.scale(scale, scale);
  ctx.drawImage(img, 0, 0, width, height);
  return new Promise<Blob>((resolve, reject) => canvas.toBlob((b) => (b ? resolve(b) : reject(new Error("PNG encoding failed"))), "image/png"));
}
