import { z } from "zod";
import { ACTIONS, ROLES } from "../permissions";
import { EmailSchema, IdSchema, PasswordSchema, PersonNameSchema } from "./common";

export const RoleSchema = z.enum(ROLES, { error: `role must be one of ${ROLES.join(", ")}` });
export const UnitSystemSchema = z.enum(["si", "us"], { error: "unitSystem must be si or us" });

export const SignUpInputSchema = z.object({
  name: PersonNameSchema,
  email: EmailSchema,
  password: PasswordSchema,
  organizationName: z
    .string({ error: "organizationName is required" })
    .trim()
    .min(2, "organizationName must be 2 to 120 characters")
    .max(120, "organizationName must be 2 to 120 characters"),
});
export type SignUpInput = z.infer<typeof SignUpInputSchema>;

export const SignInInputSchema = z.object({
  email: EmailSchema,
  password: z.string({ error: "password is required" }).min(1, "password is required").max(200),
});
export type SignInInput = z.infer<typeof SignInInputSchema>;

export const PasswordResetRequestSchema = z.object({ email: EmailSchema });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequestSchema>;

export const TokenSchema = z.string({ error: "token is required" }).min(20, "token is malformed").max(128, "token is malformed");

export const PasswordResetConfirmSchema = z.object({ token: TokenSchema, password: PasswordSchema });
export type PasswordResetConfirm = z.infer<typeof PasswordResetConfirmSchema>;

export const MeSchema = z.object({
  user: z.object({ id: IdSchema, name: z.string(), email: z.string(), unitSystem: UnitSystemSchema, alertEmails: z.boolean() }),
  organization: z.object({ id: IdSchema, name: z.string() }),
  role: RoleSchema,
  permissions: z.array(z.enum(ACTIONS)),
  localMail: z.boolean(),
});
export type Me = z.infer<typeof MeSchema>;

/** Either preference, or both; a body with neither changes nothing and is refused. */
export const PreferencesInputSchema = z
  .object({ unitSystem: UnitSystemSchema.optional(), alertEmails: z.boolean({ error: "alertEmails must be true or false" }).optional() })
  .refine((p) => p.unitSystem !== undefined || p.alertEmails !== undefined, { message: "give unitSystem (si or us) or alertEmails (true or false)", path: ["unitSystem"] });
export type PreferencesInput = z.infer<typeof PreferencesInputSchema>;
