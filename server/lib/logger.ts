/**
 * A small structured logger: one line per event on stderr, `time level message {fields}`.
 * LOG_LEVEL (debug, info, warn, error; default info, or warn under NODE_ENV=test) filters.
 */
export type LogLevel = "debug" | "info" | "warn" | "error";
export type LogFields = Record<string, unknown>;

export interface Logger {
  debug(message: string, fields?: LogFields): void;
  info(message: string, fields?: LogFields): void;
  warn(message: string, fields?: LogFields): void;
  error(message: string, fields?: LogFields): void;
}

const rank: Record<LogLevel, number> = { debug: 10, info: 20, warn: 30, error: 40 };

function threshold(): LogLevel {
  const wanted = process.env.LOG_LEVEL as LogLevel | undefined;
  if (wanted && wanted in rank) return wanted;
  return process.env.NODE_ENV === "test" ? "warn" : "info";
}

function write(level: LogLevel, message: string, fields?: LogFields): void {
  if (rank[level] < rank[threshold()]) return;
  const extra = fields && Object.keys(fields).length > 0 ? ` ${JSON.stringify(fields)}` : "";
  process.stderr.write(`${new Date().toISOString()} ${level} ${message}${extra}\n`);
}

export const logger: Logger = {
  debug: (m, f) => write("debug", m, f),
  info: (m, f) => write("info", m, f),
  warn: (m, f) => write("warn", m, f),
  error: (m, f) => write("error", m, f),
};
