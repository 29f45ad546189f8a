import { toNestErrors } from "@hookform/resolvers";
import type { FieldError, Resolver } from "react-hook-form";
import type { MaterialVersionInput, MaterialVersionInputSchema, ProposeVersionInputSchema } from "../../../../../shared/schemas/material";
import { toInput, type MaterialFormValues } from "./form-values";

type VersionSchema = typeof MaterialVersionInputSchema | typeof ProposeVersionInputSchema;

/**
 * Validates with the shared schema (the server's own rules and words) after turning the typed
 * text into the contract's shape. Issue paths are the contract's, which the form's paths mirror,
 * so each message sits beside its input; table points keep their [T, ε] index (points.2.0).
 */
export function materialResolver(schema: VersionSchema): Resolver<MaterialFormValues, unknown, MaterialVersionInput> {
  return async (values, _context, options) => {
    const result = await schema.safeParseAsync(toInput(values));
    if (result.success) return { values: result.data, errors: {} };
    const flat: Record<string, FieldError> = {};
    // With both faces alike the cold face is a copy of the warm one: its issues would repeat them.
    const copiedCold = values.properties.kind === "reflector" && values.properties.sameFaces;
    for (const issue of result.error.issues) {
      const path = issue.path.map(String).join(".") || "root";
      if (copiedCold && path.startsWith("properties.coldSide")) continue;
      flat[path] ??= { type: issue.code, message: issue.message };
    }
    return { values: {}, errors: toNestErrors(flat, options) };
  };
}
