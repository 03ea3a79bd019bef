import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { isApiError } from "./api-client";

/**
 * Puts a server failure where the user will look: each 422 issue on its field when the form
 * has that field, everything else (and field issues the form does not show) on `root`.
 */
export function applyServerError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: ReadonlyArray<Path<T>>,
): void {
  if (!isApiError(error)) {
    setError("root", { type: "server", message: "Something went wrong. Try again." });
    return;
  }
  const unplaced: string[] = [];
  for (const issue of error.issues) {
    const field = fields.find((f) => f === issue.path);
    if (field) setError(field, { type: "server", message: issue.message }, { shouldFocus: true });
    else unplaced.push(issue.message);
  }
  const placedAll = error.issues.length > 0 && unplaced.length === 0;
  if (!placedAll) {
    const message = unplaced.length ? unplaced.join(" ") : error.message;
    setError("root", { type: "server", message });
  }
}
