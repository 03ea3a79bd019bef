/** A command-line mistake: printed as one line on stderr, exit code 2. */
export class CliError extends Error {}

/**
 * Parses `--name value` pairs (and bare `--flag`s listed in `flags`) after the command word.
 * @throws CliError on an unknown option, a missing value or a repeated option
 */
export function parseOptions(argv: string[], known: readonly string[], flags: readonly string[] = []): Map<string, string> {
  const out = new Map<string, string>();
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (!a.startsWith("--")) throw new CliError(`unexpected argument ${JSON.stringify(a)}`);
    const name = a.slice(2);
    if (!known.includes(name) && !flags.includes(name)) {
      throw new CliError(`unknown option --${name} (known: ${[...known, ...flags].map((k) => "--" + k).join(", ")})`);
    }
    if (out.has(name)) throw new CliError(`option --${name} given twice`);
    if (flags.includes(name)) {
      out.set(name, "true");
      continue;
    }
    const v = argv[++i];
    if (v === undefined || v.startsWith("--")) throw new CliError(`option --${name} needs a value`);
    out.set(name, v);
  }
  return out;
}

/** A positive finite number option (or its default). */
export function positiveOption(opts: Map<string, string>, name: string, fallback?: number): number {
  const raw = opts.get(name);
  if (raw === undefined) {
    if (fallback === undefined) throw new CliError(`missing required option --${name}`);
    return fallback;
  }
  const v = Number(raw);
  if (!Number.isFinite(v) || v <= 0) throw new CliError(`--${name} must be a positive number, got ${JSON.stringify(raw)}`);
  return v;
}

/** A required string option. */
export function requiredOption(opts: Map<string, string>, name: string): string {
  const v = opts.get(name);
  if (v === undefined) throw new CliError(`missing required option --${name}`);
  return v;
}
