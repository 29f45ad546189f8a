import { z } from "zod";
import { CRYOGEN_IDS, type CryogenId } from "../thermal/fluids";
import { IdSchema } from "./common";
import { MaterialSourceSchema } from "./material";

/**
 * GET /api/cryogens: the library's approved, unretired cryogen entries the organization sees
 * (the seed built from the engine's CRYOGENS table, plus its own). Saturated at 1 atm.
 */
export const CryogenSchema = z.object({
  materialId: IdSchema,
  version: z.number().int(),
  scope: z.enum(["seed", "organization"]),
  fluid: z.enum(CRYOGEN_IDS as [CryogenId, ...CryogenId[]]),
  label: z.string(),
  saturationTemperature_K: z.number(),
  latentHeat_J_per_kg: z.number(),
  liquidDensity_kg_per_m3: z.number(),
  vapourDensity_kg_per_m3: z.number(),
  molarMass_kg_per_mol: z.number(),
  /** 1 − ρ_vapour/ρ_liquid: the share of the evaporated mass that leaves the vent. */
  ventedGasFactor: z.number(),
  source: MaterialSourceSchema,
  sourceText: z.string(),
});
export type Cryogen = z.infer<typeof CryogenSchema>;

export const CryogenListSchema = z.object({ cryogens: z.array(CryogenSchema) });
export type CryogenList = z.infer<typeof CryogenListSchema>;
