import { createContext, useContext, type ReactNode } from "react";
import type { UnitSystem } from "../../shared/units";

/**
 * The signed-in user's unit system, provided once by the app shell (like the role in can.tsx),
 * so features show and read numbers in it without importing the auth feature.
 */
const UnitSystemContext = createContext<UnitSystem>("si");

export function UnitSystemProvider({ system, children }: { system: UnitSystem; children: ReactNode }) {
  return <UnitSystemContext.Provider value={system}>{children}</UnitSystemContext.Provider>;
}

export const useUnitSystem = () => useContext(UnitSystemContext);
