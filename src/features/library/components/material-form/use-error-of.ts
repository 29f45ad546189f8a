import { get, useFormContext, type FieldError } from "react-hook-form";
import type { MaterialFormValues } from "./form-values";

/** The message at any dotted path of the form's errors, including paths the form has no input for. */
export function useErrorOf() {
  const { formState } = useFormContext<MaterialFormValues>();
  return (path: string) => (get(formState.errors, path) as FieldError | undefined)?.message;
}
