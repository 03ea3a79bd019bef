// The one place toasts come from: anything (a mutation cache, a hook, a page) calls `toast.*`,
// and the single <Toaster /> in the provider renders the queue.
export type ToastTone = "success" | "error" | "info";
export type ToastItem = { id: number; tone: ToastTone; message: string };

type Listener = () => void;

let items: ToastItem[] = [];
let nextId = 1;
const listeners = new Set<Listener>();
const timers = new Map<number, ReturnType<typeof setTimeout>>();
const LIFETIME_MS = 5000;

function emit() {
  for (const listener of listeners) listener();
}

export function dismissToast(id: number) {
  const timer = timers.get(id);
  if (timer) clearTimeout(timer);
  timers.delete(id);
  items = items.filter((t) => t.id !== id);
  emit();
}

function push(tone: ToastTone, message: string): number {
  const id = nextId++;
  // Keep the queue short: the oldest falls off when a fourth arrives.
  items = [...items.slice(-2), { id, tone, message }];
  timers.set(id, setTimeout(() => dismissToast(id), LIFETIME_MS));
  emit();
  return id;
}

export const toast = {
  success: (message: string) => push("success", message),
  error: (message: string) => push("error", message),
  info: (message: string) => push("info", message),
};

export function subscribeToasts(listener: Listener) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function getToasts(): ToastItem[] {
  return items;
}

/** Clears every toast (tests start from an empty queue). */
export function resetToasts() {
  for (const timer of timers.values()) clearTimeout(timer);
  timers.clear();
  items = [];
  emit();
}
