import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { isApiError } from "./api-client";

/**
 * Puts the server's per-field issues beside the inputs that failed, keeping what the user typed.
 * codeFields names the field a field-less error is about (a 409 "email_taken" is about the
 * e-mail). Returns the message for the form as a whole (issues on unknown fields, or the error
 * itself), or null when every issue found its field.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
  codeFields: Partial<Record<string, Path<T>>> = {},
): string | null {
  if (!isApiError(error)) return "Something went wrong. Try again.";
  const fieldForCode = codeFields[error.code];
  if (error.fields.length === 0 && fieldForCode) {
    setError(fieldForCode, { type: "server", message: error.message }, { shouldFocus: true });
    return null;
  }
  const leftOver: string[] = [];
  let first = true;
  for (const issue of error.fields) {
    const name = fieldNames.find((field) => field === issue.path);
    if (name) {
      setError(name, { type: "server", message: issue.message }, { shouldFocus: first });
      first = false;
    } else {
      leftOver.push(issue.message);
    }
  }
  if (error.fields.length > 0 && leftOver.length === 0) return null;
  return leftOver.length > 0 ? leftOver.join(" ") : error.message;
}
