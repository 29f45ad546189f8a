import { describe, expect, it } from "vitest";
import type { AssemblyDesign, LayupBlock, LayupItem } from "./assembly-design";
import { estimateAssembly } from "./assembly";
import { blanketCorrelation, CORRELATION_SETS } from "./blanket-correlation";
import { estimateLayers } from "./blanket-layers";
import { boilOff } from "./boil-off";
import { expectClose } from "./checks.test-helpers";
import type { Emissivity } from "./emissivity";
import { estimateStack } from "./radiation-network";
import { conductivityIntegral } from "./supports";

// Emissivities: 0.03 for an aluminized polyester film face, 0.1 for a polished stainless jacket
// and 0.05 for a polished vessel (common practice); they only need to be plausible here.
const FILM = 0.03;
const film = (e: Emissivity = FILM) => ({ warmSide: e, coldSide: e });

function block(layers: number, extra: Partial<LayupBlock> = {}): LayupBlock {
  return { kind: "block", layers, reflector: film(), model: "radiation", ...extra };
}

function planar(layup: LayupItem[], extra: Partial<AssemblyDesign> = {}): AssemblyDesign {
  return {
    geometry: { kind: "planar", area_m2: 1 },
    warm: { temperature_K: 300, emissivity: 0.1 },
    cold: { temperature_K: 77, emissivity: 0.05 },
    layup,
    vacuum: { pressure_Pa: 1e-4, gas: "nitrogen" },
    ...extra,
  };
}

const nitrogenStage = { kind: "stage" as const, label: "nitrogen shield", temperature_K: 77, emissivity: 0.05 };
const heliumCold = { temperature_K: 4.2, emissivity: 0.05 };

describe("estimateAssembly against the series radiation network", () => {
  it("a single radiation block in a planar design equals estimateStack", () => {
    const design = planar([block(10)], { geometry: { kind: "planar", area_m2: 2 } });
    const stack = estimateStack({
      geometry: { kind: "planar", area_m2: 2 },
      warm: design.warm,
      cold: design.cold,
      shields: new Array(10).fill(film()),
    });
    const result = estimateAssembly(design);
    expectClose(result.stages[0].heatIn.total_W, stack.heatLeak_W);
    result.blocks[0].shieldTemperatures_K!.forEach((t, k) => expectClose(t, stack.shields[k].temperature_K, 1e-12));
    expect(result.resistances).toHaveLength(1);
    expect(result.resistances[0].resistances.map((r) => r.value)).toEqual(stack.resistances.map((r) => r.value));
  });

  it("the gray-plate formula by hand: 10 shields of ε 0.03 between ε 0.1 and ε 0.1 walls, 2 m², 300 → 77 K", () => {
    // Hand check of σA(T_w⁴ − T_c⁴)/[1/ε_w + 1/ε_c − 1 + N(2/ε − 1)] (Incropera et al., 6th ed., Sec. 13.3).
    const design = planar([block(10)], { geometry: { kind: "planar", area_m2: 2 }, cold: { temperature_K: 77, emissivity: 0.1 } });
    expectClose(estimateAssembly(design).stages[0].heatIn.total_W, 1.353646824552448, 1e-12);
  });

  it("a design with a stage splits exactly into two estimateStack calls", () => {
    const design = planar([block(20), nitrogenStage, block(10)], { cold: heliumCold });
    const upper = estimateStack({ geometry: design.geometry, warm: design.warm, cold: { temperature_K: 77, emissivity: 0.05 }, shields: new Array(20).fill(film()) });
    const lower = estimateStack({ geometry: design.geometry, warm: { temperature_K: 77, emissivity: 0.05 }, cold: heliumCold, shields: new Array(10).fill(film()) });
    const [stage, cold] = estimateAssembly(design).stages;
    expectClose(stage.heatIn.total_W, upper.heatLeak_W);
    expectClose(stage.heatOut_W, lower.heatLeak_W);
    expectClose(stage.net_W, upper.heatLeak_W - lower.heatLeak_W);
    expectClose(cold.heatIn.total_W, lower.heatLeak_W);
    // Hand check of the gray-plate formula for each segment (Incropera et al., 6th ed., Sec. 13.3):
    // 300 → 77 K through 20 shields, 77 → 4.2 K through 10.
    expectClose(stage.heatIn.total_W, 0.3406806696508334, 1e-12);
    expectClose(cold.heatIn.total_W, 0.0028652966936509585, 1e-12);
  });

  it("a segment with no block is a bare gap between two gray plates", () => {
    // Hand check: σA(T₁⁴ − T₂⁴)/(1/ε₁ + 1/ε₂ − 1), large parallel plates (Incropera et al., 6th ed., Table 13.3).
    const result = estimateAssembly(planar([block(20), nitrogenStage], { cold: heliumCold }));
    expectClose(result.stages[1].heatIn.radiation_W, 0.0511100358944406, 1e-12);
    expect(result.resistances.map((l) => l.layupIndex)).toEqual([0, null]);
  });

  it("two and three blocks in one segment carry one heat: the network of all their shields in series", () => {
    // Each shield keeps its own faces, so ΣR·A = (1 − ε_w)/ε_w + (1 − ε_c)/ε_c + (N + 1) + Σ N_j[(1 − ε_j,w)/ε_j,w + (1 − ε_j,c)/ε_j,c];
    // hand check of that sum (Incropera et al., 6th ed., Sec. 13.3) for 5 + 7 + 4 shields, evaluated in Python.
    const three = planar([
      block(5, { reflector: { warmSide: 0.02, coldSide: 0.05 } }),
      block(7, { reflector: film(0.03) }),
      block(4, { reflector: { warmSide: 0.1, coldSide: 0.08 } }),
    ]);
    const result = estimateAssembly(three);
    expectClose(result.stages[0].heatIn.total_W, 0.49725301075893663, 1e-10);
    for (const b of result.blocks) expectClose(b.heat_W, 0.49725301075893663, 1e-10);
    expect(result.blocks[0].cold_K).toBe(result.blocks[1].warm_K);

    const two = estimateAssembly(planar([block(4), block(6)]));
    const one = estimateAssembly(planar([block(10)]));
    expectClose(two.stages[0].heatIn.total_W, one.stages[0].heatIn.total_W, 1e-10);
    // The interface is the warmer block's last layer: shield 4 of the single stack.
    expectClose(two.blocks[0].cold_K, one.blocks[0].shieldTemperatures_K![3], 1e-10);
  });

  it("a cylinder's lateral stack by hand, and a sphere's", () => {
    // Hand check of ΣR = (1 − ε_w)/(ε_w A_w) + (1 − ε_c)/(ε_c A_c) + Σ_{k=1}^{N+1} 1/A_k + Σ_{k=1}^{N} 2(1 − ε)/(ε A_k)
    // with F = 1 from each inner surface (Incropera et al., 6th ed., Sec. 13.3), two shields evenly
    // spaced between r = 0.35 m and 0.30 m, evaluated in Python.
    const cylinder = planar([block(2)], { geometry: { kind: "cylinder", coldRadius_m: 0.3, warmRadius_m: 0.35, length_m: 1.2 } });
    expectClose(estimateAssembly(cylinder).stages[0].heatIn.total_W, 6.941153577212611, 1e-12);
    const sphere = planar([block(2)], { geometry: { kind: "sphere", coldRadius_m: 0.3, warmRadius_m: 0.35 } });
    expectClose(estimateAssembly(sphere).stages[0].heatIn.total_W, 3.72789046002053, 1e-12);
    const radii = estimateAssembly(cylinder).shields.map((s) => s.radius_m!);
    expectClose(radii[0], 0.35 - 0.05 / 3, 1e-12);
    expectClose(radii[1], 0.3 + 0.05 / 3, 1e-12);
  });

  it("flat ends add the planar heat of the same layup on 2·π·r_c²", () => {
    const geometry = { kind: "cylinder" as const, coldRadius_m: 0.3, warmRadius_m: 0.35, length_m: 1.2 };
    const without = estimateAssembly(planar([block(10)], { geometry }));
    const withEnds = estimateAssembly(planar([block(10)], { geometry: { ...geometry, flatEnds: 2 } }));
    // Hand check of σ·2πr_c²·(T_w⁴ − T_c⁴)/[1/ε_w + 1/ε_c − 1 + N(2/ε − 1)] (Incropera et al., 6th ed., Sec. 13.3).
    expectClose(withEnds.stages[0].heatIn.total_W - without.stages[0].heatIn.total_W, 0.37715268854496603, 1e-10);
    expectClose(withEnds.blocks[0].endHeat_W, 0.37715268854496603, 1e-12);
  });

  it("the degradation factor scales a lone block and divides its resistance in a series", () => {
    const plain = estimateAssembly(planar([block(10)])).stages[0].heatIn.total_W;
    expectClose(estimateAssembly(planar([block(10, { degradationFactor: 1.5 })])).stages[0].heatIn.total_W, 1.5 * plain);
    // Q = σA(T_w⁴ − T_c⁴)/(R_A/f + R_B): hand check of the series network with block A's heat doubled
    // (Incropera et al., 6th ed., Sec. 13.3), 6 + 4 shields, evaluated in Python; 0.6669523853592154 W undegraded.
    const design = planar([block(6, { degradationFactor: 2 }), block(4)]);
    const result = estimateAssembly(design);
    expectClose(result.stages[0].heatIn.total_W, 0.914004701321723, 1e-10);
    expectClose(estimateAssembly(planar([block(6), block(4)])).stages[0].heatIn.total_W, 0.6669523853592154, 1e-10);
  });
});

describe("estimateAssembly with supports, blankets and boil-off", () => {
  it("supports add (A/L)·∫k dT·count to the sink they end on, and leave the sink they start from", () => {
    const design = planar([block(20), nitrogenStage, block(10)], {
      cold: heliumCold,
      supports: [
        { material: "stainless-304", area_m2: 1e-5, length_m: 0.2, count: 3, from: "warm", to: 0 },
        { material: "stainless-304", area_m2: 2e-6, length_m: 0.1, from: 0, to: "cold" },
      ],
    });
    const bare = estimateAssembly(planar([block(20), nitrogenStage, block(10)], { cold: heliumCold }));
    const [stage, cold] = estimateAssembly(design).stages;
    const warmToStage = (1e-5 / 0.2) * 3 * conductivityIntegral("stainless-304", 77, 300);
    const stageToCold = (2e-6 / 0.1) * conductivityIntegral("stainless-304", 4.2, 77);
    expectClose(stage.heatIn.supports_W, warmToStage);
    expectClose(cold.heatIn.supports_W, stageToCold);
    expectClose(stage.heatIn.total_W, bare.stages[0].heatIn.total_W + warmToStage);
    expectClose(stage.heatOut_W, bare.stages[0].heatOut_W + stageToCold);
    // Ekin, Experimental Techniques for Low-Temperature Measurements (2006), App. A2.1: 304 stainless
    // 77 → 300 K ≈ 3060 − 325 = 2735 W/m (from memory); so three 10 mm² × 200 mm tubes ≈ 0.41 W.
    expect(Math.abs(stage.heatIn.supports_W - (1e-5 / 0.2) * 3 * 2735)).toBeLessThan(0.02 * 0.41);
  });

  it("a correlation block is the Keller–Cunnington–Glassford flux on the area, with the pressure in torr", () => {
    const set = CORRELATION_SETS.find((s) => s.id === "kcg-1974-polyester-netting")!;
    // 1 torr = 101 325/760 Pa (NIST SP 811, 2008, App. B).
    const design = planar([block(30, { model: "correlation", layerDensity_per_cm: 20, reflector: film(0.031) })], {
      geometry: { kind: "planar", area_m2: 1.5 },
      vacuum: { pressure_Pa: (1e-6 * 101_325) / 760, gas: "nitrogen" },
    });
    const result = estimateAssembly(design);
    // Hand check of the 1974 formula (NASA CR-134477) with C_s 7.3e-8, a 2.63, C_r 7.07e-10, C_g 1.46e4,
    // 30 layers at 20 /cm, 300 → 77 K, 1e-6 torr, ε 0.031: 0.535988 W/m², × 1.5 m², evaluated in Python.
    expectClose(result.stages[0].heatIn.total_W, 0.8039819371974843, 1e-9);
    expectClose(result.stages[0].heatIn.solid_W, 0.3920825657803164, 1e-9);
    expect(set.coefficients.solid).toBe(7.3e-8);
    expect(result.blocks[0].shieldTemperatures_K).toBeNull();
    expect(result.shields.every((s) => s.temperature_K === null)).toBe(true);
    const direct = blanketCorrelation({ layers: 30, layerDensity_per_cm: 20, warm_K: 300, cold_K: 77, pressure_torr: 1e-6, emissivity: 0.031, coefficients: set.coefficients });
    expectClose(result.heatFlux_W_per_m2, direct.heatFlux_W_per_m2, 1e-9);
  });

  it("a correlation block on a cylinder uses the log-mean area 2πL(r₂ − r₁)/ln(r₂/r₁)", () => {
    // Incropera et al., 6th ed., Table 3.3 (cylindrical wall); 2π·1.2·0.05/ln(0.35/0.3) = 2.445601 m².
    const geometry = { kind: "cylinder" as const, coldRadius_m: 0.3, warmRadius_m: 0.35, length_m: 1.2 };
    const b = block(30, { model: "correlation", layerDensity_per_cm: 20 });
    const onCylinder = estimateAssembly(planar([b], { geometry })).stages[0].heatIn.total_W;
    const perSquareMetre = estimateAssembly(planar([b])).stages[0].heatIn.total_W;
    expectClose(onCylinder / perSquareMetre, 2.445601400222382, 1e-12);
  });

  it("a layers block is estimateLayers, with the spacer's thickness defaulting to the pitch 1 cm / layer density", () => {
    const spacer = { conductivity_W_per_m_K: 0.15, contactFactor: 0.001 };
    const design = planar([block(15, { model: "layers", layerDensity_per_cm: 20, spacer })]);
    const result = estimateAssembly(design);
    // Hand-derived: 0.15 × 0.001 / 0.0005 m = 0.3 W/(m²·K) per gap.
    const direct = estimateLayers({
      area_m2: 1,
      warm: design.warm,
      cold: design.cold,
      layers: 15,
      reflector: film(),
      spacer: { conductance_W_per_m2_K: 0.3 },
      gas: { gas: "nitrogen", pressure_Pa: 1e-4 },
    });
    expectClose(result.stages[0].heatIn.total_W, direct.heatLeak_W, 1e-9);
    expectClose(result.stages[0].heatIn.solid_W, direct.solid_W, 1e-9);
    expect(result.blocks[0].shieldTemperatures_K).toHaveLength(15);
  });

  it("a layers block scales a spacer conductance to its layer density and mean temperature, as h_s = C_s·N̄^a·T_m", () => {
    // The solid term of Cunnington, Keller & Glassford (NASA CR-134477, 1974): per gap
    // h_s ∝ N̄^a·T_m. Taken at 20 layers/cm and 188.5 K, used at 10 layers/cm: (10/20)^2.63 of it.
    const spacer = { conductance_W_per_m2_K: 0.0364, referenceMeanTemperature_K: 188.5, referenceLayerDensity_per_cm: 20, layerDensityExponent: 2.63 };
    const design = planar([block(15, { model: "layers", layerDensity_per_cm: 10, spacer })], { cold: heliumCold });
    const result = estimateAssembly(design);
    const direct = estimateLayers({
      area_m2: 1,
      warm: design.warm,
      cold: heliumCold,
      layers: 15,
      reflector: film(),
      spacer: { conductance_W_per_m2_K: 0.0364 * 0.5 ** 2.63, referenceTemperature_K: 188.5 },
      gas: { gas: "nitrogen", pressure_Pa: 1e-4 },
    });
    expectClose(result.stages[0].heatIn.total_W, direct.heatLeak_W, 1e-9);
    expectClose(result.stages[0].heatIn.solid_W, direct.solid_W, 1e-9);
  });

  it("refuses a spacer's density exponent without its reference density, naming the field", () => {
    const spacer = { conductance_W_per_m2_K: 0.0364, layerDensityExponent: 2.63 };
    expect(() => estimateAssembly(planar([block(15, { model: "layers", layerDensity_per_cm: 10, spacer })]))).toThrow(/layup\[0\]\.spacer\.layerDensityExponent/);
  });

  it("boil-off of each sink is boilOff of its net heat", () => {
    const design = planar([block(20), { ...nitrogenStage, temperature_K: 77.355, cryogen: "nitrogen", capacity_L: 60 }, block(10)], {
      cold: { temperature_K: 4.222, emissivity: 0.05, cryogen: "helium-4", capacity_L: 250, fillFraction: 0.9, minimumFraction: 0.1 },
      geometry: { kind: "planar", area_m2: 4 },
    });
    const [stage, cold] = estimateAssembly(design).stages;
    expect(stage.boilOff).toEqual(boilOff({ heat_W: stage.net_W, cryogen: "nitrogen", capacity_L: 60 }));
    expect(cold.boilOff).toEqual(boilOff({ heat_W: cold.net_W, cryogen: "helium-4", capacity_L: 250, fillFraction: 0.9, minimumFraction: 0.1 }));
  });

  it("warns when a bath's temperature is far from its cryogen's normal boiling point", () => {
    const design = planar([block(10)], { cold: { temperature_K: 90, emissivity: 0.05, cryogen: "nitrogen" } });
    expect(estimateAssembly(design).warnings.join(" ")).toContain("boils at 77.355 K");
  });

  it("the band is the design computed with the low and the high reflector models", () => {
    const reflector = { ...film(), low: film(0.02), high: film(0.05) };
    const result = estimateAssembly(planar([block(10, { reflector })]));
    const low = estimateAssembly(planar([block(10, { reflector: film(0.02) })])).stages[0].heatIn.total_W;
    const high = estimateAssembly(planar([block(10, { reflector: film(0.05) })])).stages[0].heatIn.total_W;
    expectClose(result.band![0].low_W, low, 1e-12);
    expectClose(result.band![0].high_W, high, 1e-12);
    expect(estimateAssembly(planar([block(10)])).band).toBeNull();
  });

  it("the wall section lists every layer and stage warm → cold", () => {
    const result = estimateAssembly(planar([block(3), nitrogenStage, block(2)], { cold: heliumCold }));
    expect(result.shields.map((s) => `${s.kind}${s.layupIndex}`)).toEqual(["layer0", "layer0", "layer0", "stage1", "layer2", "layer2"]);
    const t = result.shields.map((s) => s.temperature_K!);
    for (let i = 1; i < t.length; i++) expect(t[i]).toBeLessThan(t[i - 1]);
  });
});
