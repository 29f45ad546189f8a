import type { z } from "zod";
import { invalidInput } from "../errors";

/**
 * Parses one part of a request with its shared schema and returns the parsed, typed value.
 * A failure names every bad field; nothing has been written yet, so nothing changes.
 */
export function parseInput<S extends z.ZodType>(schema: S, value: unknown, part = "body"): z.infer<S> {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const fields = result.error.issues.map((issue) => ({
    path: issue.path.length > 0 ? issue.path.map(String).join(".") : part,
    message: issue.message,
  }));
  const summary = fields.map((f) => f.message).join("; ");
  throw invalidInput(`Check the ${part}: ${summary}`, fields);
}
