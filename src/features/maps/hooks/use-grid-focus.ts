import { useCallback, useState, type FocusEvent, type KeyboardEvent, type RefObject } from "react";

/** Slot of a cell element (its data-k attribute), or null for anything else. */
export function slotOf(target: EventTarget | null): number | null {
  const raw = (target as Element | null)?.getAttribute?.("data-k");
  return raw == null ? null : Number(raw);
}

/**
 * Roving tabindex over a muSteps × tauSteps grid of cell elements inside `container`: one cell
 * is in the tab order; arrows move it (up = larger τ), Home/End jump along the row, PageUp/Down
 * along the column, Enter or Space opens it.
 */
export function useGridFocus(container: RefObject<SVGGElement | null>, muSteps: number, tauSteps: number, onOpen?: (k: number) => void) {
  const [active, setActive] = useState(0);
  const [focused, setFocused] = useState(false);

  const moveTo = useCallback(
    (k: number) => {
      setActive(k);
      // The element exists already (every slot is drawn), so focus can move at once.
      container.current?.querySelector<SVGElement>(`[data-k="${k}"]`)?.focus();
    },
    [container],
  );

  const onKeyDown = useCallback(
    (e: KeyboardEvent) => {
      const k = slotOf(e.target);
      if (k === null) return;
      const i = k % muSteps;
      const j = Math.floor(k / muSteps);
      const next: Record<string, [number, number]> = {
        ArrowLeft: [Math.max(0, i - 1), j],
        ArrowRight: [Math.min(muSteps - 1, i + 1), j],
        ArrowUp: [i, Math.min(tauSteps - 1, j + 1)],
        ArrowDown: [i, Math.max(0, j - 1)],
        Home: [0, j],
        End: [muSteps - 1, j],
        PageUp: [i, tauSteps - 1],
        PageDown: [i, 0],
      };
      if (e.key === "Enter" || e.key === " ") {
        e.preventDefault();
        onOpen?.(k);
        return;
      }
      const to = next[e.key];
      if (!to) return;
      e.preventDefault();
      moveTo(to[0] + to[1] * muSteps);
    },
    [muSteps, tauSteps, onOpen, moveTo],
  );

  const onFocus = useCallback((e: FocusEvent) => {
    const k = slotOf(e.target);
    if (k !== null) setActive(k);
    setFocused(true);
  }, []);
  const onBlur = useCallback(() => setFocused(false), []);

  return { active: Math.min(active, muSteps * tauSteps - 1), focused, onKeyDown, onFocus, onBlur };
}
