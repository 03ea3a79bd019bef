/** Greedy word wrap into lines of at most `maxChars` characters (a long word gets its own line). */
export function wrapText(text: string, maxChars: number): string[] {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = "";
  for (const w of words) {
    if (line && line.length + 1 + w.length > maxChars) {
      lines.push(line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) lines.push(line);
  return lines;
}

/** Joins `parts` with " · ", wrapping between parts so no line passes `maxChars`. */
export function wrapParts(parts: readonly string[], maxChars: number): string[] {
  const lines: string[] = [];
  let line = "";
  for (const p of parts) {
    if (line && line.length + 3 + p.length > maxChars) {
      lines.push(line);
      line = p;
    } else line = line ? `${line} · ${p}` : p;
  }
  if (line) lines.push(line);
  return lines;
}
