import { useEffect, useState } from "react";

/** `value` once it has stopped changing for `ms` milliseconds (compared by JSON). */
export function useDebouncedValue<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
    // The JSON key stands for the value: a new object with the same content is no change.
  }, [key, ms]);
  return settled;
}
