import type { Role } from "../../shared/permissions";

export interface MailContent {
  subject: string;
  text: string;
}

const footer = "\n\n-- \nFrostfold. If you did not expect this message, you can ignore it.";

export function invitationMail(p: { organizationName: string; inviterName: string; role: Role; link: string }): MailContent {
  return {
    subject: `You are invited to ${p.organizationName} on Frostfold`,
    text:
      `${p.inviterName} invited you to join ${p.organizationName} on Frostfold as ${p.role}.\n\n` +
      `Accept the invitation and choose your password here (the link works once, for 7 days):\n${p.link}` +
      footer,
  };
}

export function passwordResetMail(p: { name: string; link: string }): MailContent {
  return {
    subject: "Reset your Frostfold password",
    text:
      `Hello ${p.name},\n\nSomeone asked to reset the password of your Frostfold account. ` +
      `Choose a new password here (the link works once, for 1 hour; every signed-in session ends when you use it):\n${p.link}` +
      footer,
  };
}

/** The links in a message body, for the local Outbox page. */
export function linksIn(text: string): string[] {
  return text.match(/https?:\/\/[^\s<>"]+/g) ?? [];
}
