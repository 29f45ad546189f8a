import { z } from "zod";
import { EmailSchema, IdSchema, PasswordSchema, PersonNameSchema } from "./common";
import { RoleSchema, TokenSchema } from "./auth";

export const MemberSchema = z.object({
  id: IdSchema, // the user's id
  name: z.string(),
  email: z.string(),
  role: RoleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof MemberSchema>;

export const InvitationSchema = z.object({
  id: IdSchema,
  email: z.string(),
  role: RoleSchema,
  expiresAt: z.string(),
  invitedBy: z.string(),
});
export type Invitation = z.infer<typeof InvitationSchema>;

export const TeamSchema = z.object({ members: z.array(MemberSchema), invitations: z.array(InvitationSchema) });
export type Team = z.infer<typeof TeamSchema>;

export const MemberParamsSchema = z.object({ id: IdSchema });
export const ChangeRoleInputSchema = z.object({ role: RoleSchema });
export type ChangeRoleInput = z.infer<typeof ChangeRoleInputSchema>;

export const InviteInputSchema = z.object({ email: EmailSchema, role: RoleSchema });
export type InviteInput = z.infer<typeof InviteInputSchema>;

export const AcceptInvitationInputSchema = z.object({ token: TokenSchema, name: PersonNameSchema, password: PasswordSchema });
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationInputSchema>;

export const OutboxMessageSchema = z.object({
  id: IdSchema,
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
  status: z.enum(["pending", "sent", "failed"]),
  attempts: z.number().int(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
});
export type OutboxMessage = z.infer<typeof OutboxMessageSchema>;
export const OutboxSchema = z.object({ messages: z.array(OutboxMessageSchema) });

export const InvitationPreviewSchema = z.object({ email: z.string(), role: RoleSchema, organizationName: z.string() });
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;
