import { describe, expect, it } from "vitest";
import { ROLES } from "../../shared/permissions";
import { CryogenListSchema } from "../../shared/schemas/cryogen";
import { CRYOGEN_IDS, CRYOGENS, ventedGasFactor } from "../../shared/thermal/fluids";
import { useTestApp } from "../support/test-app";

const t = useTestApp();

// Invented values for an organization's own nitrogen entry: a test of scoping, not of data.
const ownNitrogen = {
  name: "Nitrogen at our altitude (invented)",
  properties: { kind: "cryogen", fluid: "nitrogen", saturationTemperature_K: 76.5, latentHeat_J_per_kg: 200_000, liquidDensity_kg_per_m3: 810, vapourDensity_kg_per_m3: 4, molarMass_kg_per_mol: 0.028 },
  validRange_K: { min: 76.5, max: 76.5 },
  source: { type: "measured", test: "invented boil-off test B-1" },
};

describe("GET /api/cryogens", () => {
  it("every role reads the engine's eight cryogens, from the one fluid table, with their sources", async () => {
    for (const role of ROLES) {
      const res = await (await t.signInAs(role)).get("/api/cryogens");
      expect(res.status, role).toBe(200);
      const { cryogens } = CryogenListSchema.parse(res.body);
      expect(cryogens.map((c) => c.fluid).sort()).toEqual([...CRYOGEN_IDS].sort());
      for (const c of cryogens) {
        const fluid = CRYOGENS[c.fluid];
        expect(c).toMatchObject({
          scope: "seed",
          label: fluid.label,
          saturationTemperature_K: fluid.saturationTemperature_K,
          latentHeat_J_per_kg: fluid.latentHeat_J_per_kg,
          liquidDensity_kg_per_m3: fluid.liquidDensity_kg_per_m3,
          vapourDensity_kg_per_m3: fluid.vapourDensity_kg_per_m3,
          molarMass_kg_per_mol: fluid.molarMass_kg_per_mol,
        });
        expect(c.ventedGasFactor).toBe(ventedGasFactor(fluid));
        expect(c.sourceText).toContain(fluid.source);
      }
    }
  });

  it("helium's vented gas is about 13 % less than what evaporates (PRODUCT.md, common practice)", async () => {
    const { cryogens } = CryogenListSchema.parse((await (await t.signInAs("viewer")).get("/api/cryogens")).body);
    const helium = cryogens.find((c) => c.fluid === "helium-4")!;
    expect(1 - helium.ventedGasFactor).toBeGreaterThan(0.12);
    expect(1 - helium.ventedGasFactor).toBeLessThan(0.145);
  });

  it("adds an organization's own approved cryogen for that organization only, and drops it when retired", async () => {
    const owner = await t.signInAs("owner");
    const created = await owner.post("/api/materials").send(ownNitrogen);
    expect(created.status).toBe(201);
    const seen = async (agent: typeof owner) => CryogenListSchema.parse((await agent.get("/api/cryogens")).body).cryogens.map((c) => c.label);
    expect(await seen(owner)).not.toContain(ownNitrogen.name); // a draft is not offered
    await owner.post(`/api/materials/${created.body.id}/approval`).send({ decision: "approve" });
    const mine = CryogenListSchema.parse((await owner.get("/api/cryogens")).body).cryogens.find((c) => c.label === ownNitrogen.name)!;
    expect(mine).toMatchObject({ scope: "organization", fluid: "nitrogen", ventedGasFactor: 1 - 4 / 810, sourceText: "Measured in-house: invented boil-off test B-1" });
    const other = (await t.signUpOtherOrganization()).agent;
    expect(await seen(other)).toHaveLength(CRYOGEN_IDS.length);
    await owner.post(`/api/materials/${created.body.id}/retire`).send({});
    expect(await seen(owner)).not.toContain(ownNitrogen.name);
  });

  it("without a session gives 401", async () => {
    expect((await t.agent().get("/api/cryogens")).status).toBe(401);
  });
});
