import type { DesignContentInput } from "../../shared/schemas/design";
import { DesignContentSchema } from "../../shared/schemas/design";
import { DEMO_ORGANIZATION, DEMO_USERS } from "../db/seed/demo";
import * as accounts from "../db/repositories/accounts";
import { findSeedMaterial } from "../db/repositories/materials";
import { listDesigns } from "../db/repositories/designs";
import type { Actor, ServiceContext } from "./context";
import { createDesign, saveRevision } from "./designs";

/**
 * The invented demo lab's designs (PRODUCT.md): a 250 L liquid-helium magnet cryostat with a
 * nitrogen-cooled shield, a 180 L liquid-nitrogen storage dewar and a small detector dewar, each
 * with a few revisions. Dimensions are invented for the demo; materials are the library's seed.
 */
type Ref = { materialId: string; version: number };

async function seedRefs(ctx: ServiceContext) {
  const ids = {
    steel: "seed-wall-ss304-polished",
    aluminium: "seed-wall-al-alloy-polished",
    film: "seed-reflector-al-polyester",
    polyimide: "seed-reflector-al-polyimide",
    netting: "seed-spacer-polyester-netting",
    helium: "seed-cryogen-helium-4",
    nitrogen: "seed-cryogen-nitrogen",
    g10: "seed-support-g10-warp",
    ss304: "seed-support-ss304",
    kcg: "seed-corr-kcg-1974-polyester-netting".slice(0, 32), // the seed clips ids to 32 characters
  } as const;
  const refs = {} as Record<keyof typeof ids, Ref>;
  for (const [key, id] of Object.entries(ids) as [keyof typeof ids, string][]) {
    const found = await findSeedMaterial(ctx.db, id);
    if (!found?.material.currentVersion) throw new Error(`demo designs need the library seed entry ${id}`);
    refs[key] = { materialId: id, version: found.material.currentVersion };
  }
  return refs;
}

function heliumCryostat(r: Awaited<ReturnType<typeof seedRefs>>, warmLayers: number, coldLayers: number, withSupports: boolean): DesignContentInput {
  return {
    geometry: { kind: "cylinder", coldRadius_m: 0.33, warmRadius_m: 0.41, length_m: 1.1, flatEnds: 2 },
    warm: { temperature_K: 295, finish: r.steel },
    cold: { cryogen: r.helium, finish: r.steel, capacity_L: 250, fillFraction: 0.95, minimumFraction: 0.1 },
    layup: [
      { kind: "block", label: "Outer blanket", layers: warmLayers, reflector: r.film, spacer: r.netting, layerDensity_per_cm: 20, model: "layers", degradationFactor: 1.5 },
      { kind: "stage", label: "Nitrogen-cooled shield", temperature_K: 77.4, cryogen: r.nitrogen, capacity_L: 60, finish: r.aluminium },
      { kind: "block", label: "Inner blanket", layers: coldLayers, reflector: r.film, spacer: r.netting, layerDensity_per_cm: 15, model: "layers", degradationFactor: 1.5 },
    ],
    supports: withSupports
      ? [
          { label: "Glass-epoxy straps, jacket to shield", material: r.g10, area_m2: 1.2e-4, length_m: 0.25, count: 6, from: "warm", to: 0 },
          { label: "Glass-epoxy straps, shield to vessel", material: r.g10, area_m2: 0.8e-4, length_m: 0.2, count: 6, from: 0, to: "cold" },
        ]
      : [],
    vacuum: { pressure_Pa: 1e-4, gas: "helium" },
    targetColdHeat_W: 0.15,
  };
}

function nitrogenDewar(r: Awaited<ReturnType<typeof seedRefs>>, layers: number): DesignContentInput {
  return {
    geometry: { kind: "cylinder", coldRadius_m: 0.27, warmRadius_m: 0.32, length_m: 0.85, flatEnds: 2 },
    warm: { temperature_K: 295, finish: r.steel },
    cold: { cryogen: r.nitrogen, finish: r.steel, capacity_L: 180, fillFraction: 1, minimumFraction: 0.05 },
    layup: [{ kind: "block", label: "Blanket", layers, reflector: r.film, layerDensity_per_cm: 25, model: "correlation", correlationSet: r.kcg, degradationFactor: 2 }],
    supports: [{ label: "Stainless neck tube", material: r.ss304, area_m2: 2.4e-4, length_m: 0.3, count: 1, from: "warm", to: "cold" }],
    vacuum: { pressure_Pa: 1e-3, gas: "nitrogen" },
    targetColdHeat_W: 3,
  };
}

function detectorDewar(r: Awaited<ReturnType<typeof seedRefs>>, layers: number): DesignContentInput {
  return {
    geometry: { kind: "sphere", coldRadius_m: 0.09, warmRadius_m: 0.13 },
    warm: { temperature_K: 295, finish: r.steel },
    cold: { cryogen: r.nitrogen, finish: r.aluminium, capacity_L: 3, fillFraction: 1, minimumFraction: 0.1 },
    layup: [{ kind: "block", label: "Blanket", layers, reflector: r.polyimide, layerDensity_per_cm: 20, model: "radiation", degradationFactor: 1.5 }],
    supports: [{ label: "Fill tube", material: r.ss304, area_m2: 3e-5, length_m: 0.12, count: 1, from: "warm", to: "cold" }],
    vacuum: { pressure_Pa: 1e-3, gas: "nitrogen" },
  };
}

export const DEMO_DESIGN_NAMES = ["250 L helium magnet cryostat", "180 L liquid-nitrogen storage dewar", "Detector dewar, 3 L"] as const;

/** Seeds the demo designs once, as the demo engineer; a second run finds them and stops. */
export async function seedDemoDesigns(ctx: ServiceContext): Promise<boolean> {
  const engineer = await accounts.findUserByEmail(ctx.db, DEMO_USERS[1].email);
  const account = engineer ? await accounts.findAccountByUserId(ctx.db, engineer.id) : null;
  if (!account || account.organization.name !== DEMO_ORGANIZATION) return false;
  const actor: Actor = { userId: account.user.id, organizationId: account.organization.id, role: account.membership.role, sessionId: "seed" };
  const existing = await listDesigns(ctx.db, actor.organizationId);
  if (existing.some((d) => d.design.name === DEMO_DESIGN_NAMES[0])) return false;
  const r = await seedRefs(ctx);
  const parse = (c: DesignContentInput) => DesignContentSchema.parse(c);

  const cryostat = await createDesign(ctx, actor, { name: DEMO_DESIGN_NAMES[0], vesselLabel: "Magnet cryostat MC-250", content: parse(heliumCryostat(r, 20, 10, false)), changeNote: "First sizing: blankets only" });
  const rev2 = await saveRevision(ctx, actor, cryostat.id, { baseRevision: 1, content: parse(heliumCryostat(r, 20, 10, true)), changeNote: "Added the suspension straps" });
  await saveRevision(ctx, actor, cryostat.id, { baseRevision: rev2.revision, content: parse(heliumCryostat(r, 30, 10, true)), changeNote: "Thirty layers on the outer blanket" });

  const dewar = await createDesign(ctx, actor, { name: DEMO_DESIGN_NAMES[1], vesselLabel: "Storage dewar SD-180", content: parse(nitrogenDewar(r, 20)), changeNote: "As delivered" });
  await saveRevision(ctx, actor, dewar.id, { baseRevision: 1, content: parse(nitrogenDewar(r, 40)), changeNote: "Forty layers after the blanket rework" });

  const detector = await createDesign(ctx, actor, { name: DEMO_DESIGN_NAMES[2], vesselLabel: "Detector dewar DD-3", content: parse(detectorDewar(r, 10)), changeNote: "First sizing" });
  await saveRevision(ctx, actor, detector.id, { baseRevision: 1, content: parse(detectorDewar(r, 15)), changeNote: "Fifteen layers" });
  return true;
}
