import { z } from "zod";

/** Ids are opaque strings made on the server (random, URL-safe). */
export const IdSchema = z.string().min(1, "id is required").max(64, "id must be at most 64 characters");

export const EmailSchema = z
  .string({ error: "email is required" })
  .trim()
  .toLowerCase()
  .max(254, "email must be at most 254 characters")
  .pipe(z.email({ error: "email must be an e-mail address such as name@example.com" }));

export const PASSWORD_MIN_LENGTH = 10;
export const PasswordSchema = z
  .string({ error: "password is required" })
  .min(PASSWORD_MIN_LENGTH, `password must be at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(200, "password must be at most 200 characters");

export const PersonNameSchema = z
  .string({ error: "name is required" })
  .trim()
  .min(1, "name must be 1 to 100 characters")
  .max(100, "name must be 1 to 100 characters");

/** The one error body every failing request returns. */
export const ErrorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    requestId: z.string().optional(),
    fields: z.array(z.object({ path: z.string(), message: z.string() })).optional(),
  }),
});
export type ErrorBody = z.infer<typeof ErrorBodySchema>;
export type FieldIssue = NonNullable<ErrorBody["error"]["fields"]>[number];
