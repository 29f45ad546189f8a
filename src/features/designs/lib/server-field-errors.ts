import type { FieldPath, UseFormSetError } from "react-hook-form";
import type { DesignContentInput } from "../../../../shared/schemas/design";
import { isApiError } from "../../../lib/api-client";

/**
 * The server's per-field issues on a design, marked on the form (the paths are the form's own,
 * "layup.1.spacer"), keeping what was typed. A prefix strips "content." from a save's paths.
 * Returns every message, so the page can also list them where the results are.
 */
export function markDesignErrors(error: unknown, setError: UseFormSetError<DesignContentInput>, prefix = ""): string[] {
  if (!isApiError(error)) return [error instanceof Error ? error.message : "Something went wrong. Try again."];
  if (error.fields.length === 0) return [error.message];
  for (const issue of error.fields) {
    const path = issue.path.startsWith(prefix) ? issue.path.slice(prefix.length) : issue.path;
    if (path) setError(path as FieldPath<DesignContentInput>, { type: "server", message: issue.message });
  }
  return error.fields.map((f) => f.message);
}
