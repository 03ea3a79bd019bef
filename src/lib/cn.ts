/** A class-name value: strings are kept, falsy values dropped, nested lists flattened. */
export type ClassValue = string | false | null | undefined | ClassValue[];

/**
 * Joins Tailwind class names, skipping falsy parts. No conflict resolution: components put
 * their overridable defaults first and callers' classes last, and avoid fighting utilities.
 */
export function cn(...parts: ClassValue[]): string {
  const out: string[] = [];
  for (const part of parts) {
    if (!part) continue;
    if (Array.isArray(part)) {
      const inner = cn(...part);
      if (inner) out.push(inner);
    } else {
      out.push(part);
    }
  }
  return out.join(" ");
}
