import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { fileURLToPath } from "node:url";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");

export interface WorkerProcess {
  child: ChildProcess;
  /** Everything the process wrote, for failure messages. */
  output(): string;
  /** Resolves with the exit code (or the signal name). */
  exited: Promise<number | string>;
}

/**
 * Starts `node --import tsx server/worker.ts` as its own process against `databaseUrl` and
 * resolves once it reports ready.
 */
export async function spawnWorker(databaseUrl: string, env: Record<string, string> = {}): Promise<WorkerProcess> {
  const child = spawn(process.execPath, ["--import", "tsx", "server/worker.ts"], {
    cwd: ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl, WORKER_THREADS: "1", WORKER_POLL_SECONDS: "0.5", LOG_LEVEL: "warn", ...env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let text = "";
  child.stdout!.on("data", (b: Buffer) => (text += b.toString()));
  child.stderr!.on("data", (b: Buffer) => (text += b.toString()));
  const exited = new Promise<number | string>((resolve) => child.on("exit", (code, signal) => resolve(code ?? signal ?? "unknown")));
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`worker did not get ready:\n${text}`)), 30_000);
    const onData = () => {
      if (/worker .* ready/.test(text)) {
        clearTimeout(timer);
        resolve();
      }
    };
    child.stdout!.on("data", onData);
    void exited.then((code) => {
      clearTimeout(timer);
      reject(new Error(`worker exited (${code}) before it was ready:\n${text}`));
    });
  });
  return { child, output: () => text, exited };
}
