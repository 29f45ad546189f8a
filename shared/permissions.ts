/**
 * One table from role to allowed actions. The server enforces it on every route; the client
 * reads the same table only to hide controls a role cannot use.
 */
export const ROLES = ["owner", "engineer", "technician", "viewer"] as const;
export type Role = (typeof ROLES)[number];

export const ACTIONS = [
  "read:organization",
  "read:team",
  "manage:team",
  "read:outbox",
  "read:design",
  "edit:design",
  "delete:design",
  "read:material",
  "propose:material",
  "approve:material",
  "retire:material",
  "read:test",
  "create:test",
  "comment:test",
  "delete:test",
  "acknowledge:alert",
  /** Alert e-mails for the designs one created or revised. */
  "receive:alert-mail",
  /** Alert e-mails for every design of the organization. */
  "receive:every-alert-mail",
  "edit:settings",
] as const;
export type Action = (typeof ACTIONS)[number];

const READ: Action[] = ["read:organization", "read:team", "read:design", "read:material", "read:test"];

export const PERMISSIONS: Record<Role, readonly Action[]> = {
  owner: [...ACTIONS],
  engineer: [...READ, "edit:design", "propose:material", "create:test", "comment:test", "acknowledge:alert", "receive:alert-mail"],
  technician: [...READ, "create:test", "comment:test"],
  viewer: [...READ],
};

export function can(role: Role, action: Action): boolean {
  return PERMISSIONS[role].includes(action);
}

export function rolesThatCan(action: Action): Role[] {
  return ROLES.filter((role) => can(role, action));
}

export function permissionsOf(role: Role): Action[] {
  return [...PERMISSIONS[role]];
}
