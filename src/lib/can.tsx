import { createContext, useContext, type ReactNode } from "react";
import { can, type Action, type Role } from "../../shared/permissions";

/**
 * The signed-in role, provided once by the app shell, so features can hide controls without
 * importing the auth feature. Hiding is comfort only: the server checks every request.
 */
const RoleContext = createContext<Role | null>(null);

export function RoleProvider({ role, children }: { role: Role; children: ReactNode }) {
  return <RoleContext.Provider value={role}>{children}</RoleContext.Provider>;
}

export function useCan(action: Action): boolean {
  const role = useContext(RoleContext);
  return role !== null && can(role, action);
}

export function Can({ action, children, fallback = null }: { action: Action; children: ReactNode; fallback?: ReactNode }) {
  return <>{useCan(action) ? children : fallback}</>;
}
