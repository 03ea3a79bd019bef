import type { LayerId } from "../../../../shared/maps/layers";
import { layerScale } from "./color-scale";
import { layerValues, type GridModel } from "./grid-model";
import { SPECIAL_FILLS } from "./palettes";

function rgb(hex: string): [number, number, number] {
  const n = parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/**
 * A 24-bit BMP of width × height pixels from a colour per pixel, rows listed bottom-up (the
 * order BMP stores them in). BMP needs no compression, so a thumbnail is a few lines of code
 * instead of a canvas (which lists of many cards, and test DOMs, do without).
 */
export function bmpDataUrl(width: number, height: number, colorAt: (x: number, yFromBottom: number) => string): string {
  const rowBytes = Math.ceil((width * 3) / 4) * 4;
  const size = 54 + rowBytes * height;
  const bytes = new Uint8Array(size);
  const view = new DataView(bytes.buffer);
  bytes.set([0x42, 0x4d]);
  view.setUint32(2, size, true);
  view.setUint32(10, 54, true);
  view.setUint32(14, 40, true);
  view.setInt32(18, width, true);
  view.setInt32(22, height, true);
  view.setUint16(26, 1, true);
  view.setUint16(28, 24, true);
  view.setUint32(34, rowBytes * height, true);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const [r, g, b] = rgb(colorAt(x, y));
      bytes.set([b, g, r], 54 + y * rowBytes + x * 3);
    }
  }
  let binary = "";
  for (let k = 0; k < bytes.length; k += 0x8000) binary += String.fromCharCode(...bytes.subarray(k, k + 0x8000));
  return `data:image/bmp;base64,${btoa(binary)}`;
}

/** One pixel per cell of the map in a layer's colours (τ upwards), pending cells pale. */
export function mapThumbnail(grid: GridModel, layer: LayerId): string {
  const values = layerValues(grid, layer);
  const scale = layerScale(layer, values);
  return bmpDataUrl(grid.muSteps, grid.tauSteps, (i, j) => {
    const k = i + j * grid.muSteps;
    const c = grid.cells[k];
    if (!c || c.state === "pending") return SPECIAL_FILLS.pending;
    if (c.state === "failed") return SPECIAL_FILLS.failed;
    return Number.isNaN(values[k]) ? SPECIAL_FILLS.empty : scale.colorOf(values[k]);
  });
}
