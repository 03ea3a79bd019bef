import { useCallback, useRef, useState, type PointerEvent } from "react";
import { slotOf, useGridFocus } from "../../hooks/use-grid-focus";
import type { CellPaint } from "../../lib/cell-paints";
import { SPECIAL_FILLS } from "../../lib/palettes";
import { band } from "../../../../lib/axis-scale";
import { HeatCells } from "./heat-cells";

interface CellLayerProps {
  muSteps: number;
  tauSteps: number;
  width: number;
  height: number;
  paints: readonly CellPaint[];
  /** Makes the cells focusable and clickable. */
  onOpen?: (i: number, j: number) => void;
  /** The slot under the pointer or with the keyboard focus (null when none). */
  onHover?: (slot: number | null) => void;
}

/**
 * The cells with their interaction: one listener set for all of them (pointer, click, keys),
 * roving focus, and a ring around the cell pointed at. Hover state lives here, so moving the
 * pointer redraws the ring, not the figure.
 */
export function CellLayer({ muSteps, tauSteps, width, height, paints, onOpen, onHover }: CellLayerProps) {
  const ref = useRef<SVGGElement>(null);
  const open = useCallback((k: number) => onOpen?.(k % muSteps, Math.floor(k / muSteps)), [onOpen, muSteps]);
  const focus = useGridFocus(ref, muSteps, tauSteps, onOpen ? open : undefined);
  const [hover, setHover] = useState<number | null>(null);
  const interactive = Boolean(onOpen);
  const ring = hover ?? (focus.focused ? focus.active : null);

  const point = (e: PointerEvent) => {
    const k = slotOf(e.target);
    if (k === hover) return;
    setHover(k);
    onHover?.(k);
  };
  const leave = () => {
    setHover(null);
    onHover?.(focus.focused ? focus.active : null);
  };
  const box = ring === null ? null : { x: band(ring % muSteps, muSteps, [0, width]), y: band(Math.floor(ring / muSteps), tauSteps, [height, 0]) };

  return (
    <>
      <g
        ref={ref}
        className={interactive ? "cursor-pointer [&_rect]:outline-none" : undefined}
        shapeRendering="crispEdges"
        role={interactive ? "group" : undefined}
        aria-label={interactive ? "Cells: arrow keys move, Enter opens the cell" : undefined}
        onKeyDown={interactive ? focus.onKeyDown : undefined}
        onFocus={(e) => {
          if (!interactive) return;
          focus.onFocus(e);
          onHover?.(slotOf(e.target));
        }}
        onBlur={interactive ? focus.onBlur : undefined}
        onClick={(e) => {
          const k = slotOf(e.target);
          if (interactive && k !== null) open(k);
        }}
        onPointerMove={onHover ? point : undefined}
        onPointerLeave={onHover ? leave : undefined}
      >
        <HeatCells muSteps={muSteps} tauSteps={tauSteps} width={width} height={height} paints={paints} active={interactive ? focus.active : -1} />
      </g>
      {box && <rect data-export="skip" pointerEvents="none" x={box.x.start} y={box.y.start} width={box.x.size} height={box.y.size} fill="none" stroke={SPECIAL_FILLS.ink} strokeWidth={2} />}
    </>
  );
}
