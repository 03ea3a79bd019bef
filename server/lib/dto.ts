/** Dates leave the server as ISO 8601 strings, the form the shared schemas expect. */
export function iso(date: Date): string {
  return date.toISOString();
}
