import type { Role } from "../../../shared/permissions";
import type { Db } from "../client";
import * as accounts from "../repositories/accounts";
import { insertAuditEntry } from "../repositories/audit";

/** The invented demo lab; nothing here describes a real place or person. */
export const DEMO_PASSWORD = "frostfold-demo";
export const DEMO_ORGANIZATION = "Kestrel Bay Research Station";
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: "owner@kestrelbay.example", name: "Maren Okafor", role: "owner" },
  { email: "engineer@kestrelbay.example", name: "Tomas Lindqvist", role: "engineer" },
  { email: "technician@kestrelbay.example", name: "Ada Reyes", role: "technician" },
  { email: "viewer@kestrelbay.example", name: "Jun Halvorsen", role: "viewer" },
];

/**
 * Seeds the demo organization and its users once; a second run finds the owner and stops.
 * hashPassword is passed in so the db layer needs no service import.
 */
export async function seedDemo(db: Db, deps: { hashPassword: (p: string) => Promise<string>; newId: () => string; now: Date }): Promise<boolean> {
  if (await accounts.findUserByEmail(db, DEMO_USERS[0].email)) return false;
  const passwordHash = await deps.hashPassword(DEMO_PASSWORD);
  const organizationId = deps.newId();
  await db.transaction(async (tx) => {
    await accounts.insertOrganization(tx, { id: organizationId, name: DEMO_ORGANIZATION, createdAt: deps.now });
    for (const person of DEMO_USERS) {
      const userId = deps.newId();
      await accounts.insertUser(tx, { id: userId, email: person.email, name: person.name, passwordHash, createdAt: deps.now });
      await accounts.insertMembership(tx, { id: deps.newId(), organizationId, userId, role: person.role, createdAt: deps.now });
    }
    await insertAuditEntry(tx, organizationId, { actorUserId: null, action: "organization.seed", entityType: "organization", entityId: organizationId }, deps.now);
  });
  return true;
}
