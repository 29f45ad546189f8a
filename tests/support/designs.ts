import { expect } from "vitest";
import type { DesignContentInput } from "../../shared/schemas/design";
import type { TestApp } from "./test-app";

type Agent = ReturnType<TestApp["agent"]>;

/** The current approved version of a library entry, as a design refers to it. */
export async function libraryRef(agent: Agent, materialId: string) {
  const res = await agent.get(`/api/materials/${materialId}`);
  expect(res.status, materialId).toBe(200);
  return { materialId, version: res.body.currentVersion as number };
}

/** A flat 2 m² panel between a 300 K polished-steel wall and a cryogen bath, with one radiation block. */
export async function panelContent(
  agent: Agent,
  options: { cryogen?: "nitrogen" | "helium"; layers?: number; capacity_L?: number; targetColdHeat_W?: number } = {},
): Promise<DesignContentInput> {
  const steel = await libraryRef(agent, "seed-wall-ss304-polished");
  const cryogen = await libraryRef(agent, options.cryogen === "helium" ? "seed-cryogen-helium-4" : "seed-cryogen-nitrogen");
  return {
    geometry: { kind: "planar", area_m2: 2 },
    warm: { temperature_K: 300, finish: steel },
    cold: { cryogen, finish: steel, capacity_L: options.capacity_L ?? 100 },
    layup: [{ kind: "block", layers: options.layers ?? 10, reflector: await libraryRef(agent, "seed-reflector-al-polyester"), layerDensity_per_cm: 20, model: "radiation" }],
    vacuum: { pressure_Pa: 1e-4, gas: options.cryogen === "helium" ? "helium" : "nitrogen" },
    ...(options.targetColdHeat_W !== undefined ? { targetColdHeat_W: options.targetColdHeat_W } : {}),
  };
}
