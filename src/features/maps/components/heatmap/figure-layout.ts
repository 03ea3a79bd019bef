import type { LayerScale } from "../../lib/color-scale";
import { wrapParts } from "../../lib/wrap-text";
import { legendLayout } from "./color-legend";

/** Where each part of the map figure goes, for a given overall width. */
export interface FigureLayout {
  width: number;
  height: number;
  left: number;
  plotTop: number;
  plotWidth: number;
  plotHeight: number;
  legendTop: number;
  legendWidth: number;
  settingsTop: number;
  settings: string[];
  /** The line under the title, wrapped to the width. */
  subtitle: string[];
}

/**
 * Title on top, then the m axis (when there is one), the plot with μ below and τ on the left,
 * the colour key under it, and the settings line last. Cells stay roughly square up to a
 * comfortable height.
 */
export function figureLayout(width: number, steps: { mu: number; tau: number }, hasMAxis: boolean, scale: LayerScale, text: { settings: string[]; subtitle: string[] }): FigureLayout {
  const left = 64;
  const right = 18;
  const chars = Math.max(30, Math.floor((width - 24) / 6.1));
  const subtitle = wrapParts(text.subtitle, chars);
  const plotWidth = Math.max(120, width - left - right);
  const plotTop = 36 + subtitle.length * 15 + (hasMAxis ? 40 : 6);
  const plotHeight = Math.round(Math.min(440, Math.max(180, (plotWidth * steps.tau) / steps.mu)));
  const legendTop = plotTop + plotHeight + 52;
  const legendWidth = plotWidth;
  const settingsTop = legendTop + legendLayout(scale, legendWidth).height + 4;
  const lines = wrapParts(text.settings, chars);
  return {
    width,
    height: settingsTop + lines.length * 14 + 10,
    left,
    plotTop,
    plotWidth,
    plotHeight,
    legendTop,
    legendWidth,
    settingsTop,
    settings: lines,
    subtitle,
  };
}
