import { readFileSync } from "node:fs";

/**
 * CPU seconds spent so far by the calling thread (main or worker), for per-thread figures that
 * other processes' load does not distort: process.threadCpuUsage where Node has it (≥ 23.9),
 * else Linux's /proc/thread-self/schedstat (first field: nanoseconds on a CPU).
 * @returns the thread's CPU seconds, or null where neither source exists
 */
export function threadCpuSeconds(): number | null {
  const own = (process as { threadCpuUsage?: () => NodeJS.CpuUsage }).threadCpuUsage;
  if (typeof own === "function") {
    const u = own.call(process);
    return (u.user + u.system) / 1e6;
  }
  try {
    const ns = Number(readFileSync("/proc/thread-self/schedstat", "utf8").split(" ")[0]);
    return Number.isFinite(ns) ? ns / 1e9 : null;
  } catch {
    return null;
  }
}
