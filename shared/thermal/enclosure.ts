import { STEFAN_BOLTZMANN_W_PER_M2_K4 as SIGMA, ThermalInputError, requireAbove, requireEmissivityValue, requireInRange } from "./errors";
import { solveLinearSystem } from "./linear-solve";

/** One surface of a gray, diffuse, opaque enclosure; give exactly one boundary condition. */
export interface EnclosureSurface {
  area_m2: number;
  emissivity: number;
  temperature_K?: number;
  /** Net radiative heat leaving the surface (positive out). */
  netHeat_W?: number;
  /** Adiabatic: net heat 0, temperature found from the radiosity. */
  reradiating?: boolean;
}

export interface EnclosureInput {
  surfaces: EnclosureSurface[];
  /** viewFactors[i][j] = F_ij, the fraction of radiation leaving i that reaches j. */
  viewFactors: number[][];
}

export interface EnclosureResult {
  surfaces: { temperature_K: number; netHeat_W: number; radiosity_W_per_m2: number }[];
}

export const MAX_ENCLOSURE_SURFACES = 500;

/**
 * Throws ThermalInputError unless F is square, every F_ij is in [0, 1], every row sums to 1
 * (summation rule) and A_i·F_ij = A_j·F_ji (reciprocity), each within `tolerance`, the
 * reciprocity one relative to the larger area (Incropera, DeWitt, Bergman & Lavine,
 * Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 13.1.2, Eqs. 13.3 and 13.4; numbers from
 * memory).
 */
export function checkViewFactors(areas_m2: number[], F: number[][], tolerance = 1e-6): void {
  requireInRange("tolerance", tolerance, 0, 0.1);
  if (!Array.isArray(areas_m2) || areas_m2.length === 0) throw new ThermalInputError("areas_m2", areas_m2, "a non-empty list of areas");
  areas_m2.forEach((area, i) => requireAbove(`areas_m2[${i}]`, area, 0, "m²"));
  const n = areas_m2.length;
  if (!Array.isArray(F) || F.length !== n) throw new ThermalInputError("viewFactors", F, `a ${n}×${n} matrix, one row per surface`);
  F.forEach((row, i) => {
    if (!Array.isArray(row) || row.length !== n) throw new ThermalInputError(`viewFactors[${i}]`, row, `a row of ${n} view factors`);
    let sum = 0;
    row.forEach((value, j) => {
      if (typeof value !== "number" || !Number.isFinite(value) || value < -tolerance || value > 1 + tolerance) {
        throw new ThermalInputError(`viewFactors[${i}][${j}]`, value, "a view factor from 0 to 1");
      }
      sum += value;
    });
    if (Math.abs(sum - 1) > tolerance) {
      throw new ThermalInputError(`viewFactors[${i}]`, `row sum ${sum}`, `a row summing to 1 within ${tolerance} (summation rule)`);
    }
  });
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const mismatch = Math.abs(areas_m2[i] * F[i][j] - areas_m2[j] * F[j][i]);
      if (mismatch > tolerance * Math.max(areas_m2[i], areas_m2[j])) {
        throw new ThermalInputError(
          `viewFactors[${j}][${i}]`,
          F[j][i],
          `${(areas_m2[i] * F[i][j]) / areas_m2[j]} so that A_${i}·F_${i}${j} = A_${j}·F_${j}${i} (reciprocity)`,
        );
      }
    }
  }
}

/**
 * The net-radiation (radiosity) method for an N-surface gray, diffuse enclosure
 * (Incropera et al., 6th ed., Sec. 13.2: q_i = (E_bi − J_i)/((1 − ε_i)/(ε_i A_i)) and
 * q_i = Σ_j A_i F_ij (J_i − J_j)). One linear equation per surface: a known temperature ties J_i
 * to E_bi through the surface resistance (J_i = E_bi when ε_i = 1), a known net heat or a
 * re-radiating wall fixes Σ_j A_i F_ij (J_i − J_j), so the emissivity of such a surface never
 * enters the radiosities, only its temperature.
 */
export function solveEnclosure(input: EnclosureInput): EnclosureResult {
  const surfaces = validateSurfaces(input);
  const n = surfaces.length;
  const F = input.viewFactors;
  checkViewFactors(surfaces.map((s) => s.area_m2), F);
  const matrix: number[][] = [];
  const rhs: number[] = [];
  surfaces.forEach((s, i) => {
    const row = new Array<number>(n).fill(0);
    let seen = 0;
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      row[j] = -F[i][j];
      seen += F[i][j];
    }
    if (s.temperature_K !== undefined && s.emissivity === 1) {
      row.fill(0);
      row[i] = 1;
      rhs.push(SIGMA * s.temperature_K ** 4);
    } else if (s.temperature_K !== undefined) {
      // ε/(1 − ε) is the inverse surface resistance per unit area. Divide the row by its
      // diagonal so a nearly black surface (ε/(1 − ε) ~ 1e15) does not swamp the pivot test.
      const conductance = s.emissivity / (1 - s.emissivity);
      const diagonal = seen + conductance;
      for (let j = 0; j < n; j++) row[j] /= diagonal;
      row[i] = 1;
      rhs.push((conductance / diagonal) * SIGMA * s.temperature_K ** 4);
    } else {
      row[i] = seen;
      rhs.push((s.netHeat_W ?? 0) / s.area_m2);
    }
    matrix.push(row);
  });
  let radiosity: number[];
  try {
    radiosity = solveLinearSystem(matrix, rhs);
  } catch (error) {
    if (!(error instanceof ThermalInputError)) throw error;
    throw new ThermalInputError(
      "viewFactors",
      "a singular radiosity system",
      "a view-factor matrix in which every surface exchanges radiation, directly or through others, with a surface of known temperature",
    );
  }
  return {
    surfaces: surfaces.map((s, i) => {
      const J = radiosity[i];
      let exchange = 0;
      for (let j = 0; j < n; j++) if (j !== i) exchange += F[i][j] * (J - radiosity[j]);
      if (s.temperature_K !== undefined) {
        return { temperature_K: s.temperature_K, netHeat_W: s.area_m2 * exchange, radiosity_W_per_m2: J };
      }
      const netHeat_W = s.netHeat_W ?? 0;
      const emissive = s.emissivity === 1 || netHeat_W === 0 ? J : J + (netHeat_W * (1 - s.emissivity)) / (s.emissivity * s.area_m2);
      if (!(emissive > 0)) {
        throw new ThermalInputError(`surfaces[${i}].netHeat_W`, netHeat_W, "a net heat the enclosure can take (this one needs a temperature at or below 0 K)");
      }
      return { temperature_K: Math.sqrt(Math.sqrt(emissive / SIGMA)), netHeat_W, radiosity_W_per_m2: J };
    }),
  };
}

function validateSurfaces(input: EnclosureInput): EnclosureSurface[] {
  if (input === null || typeof input !== "object") throw new ThermalInputError("input", input, "an enclosure { surfaces, viewFactors }");
  const { surfaces } = input;
  if (!Array.isArray(surfaces) || surfaces.length < 2 || surfaces.length > MAX_ENCLOSURE_SURFACES) {
    throw new ThermalInputError("surfaces", Array.isArray(surfaces) ? `${surfaces.length} surfaces` : surfaces, `a list of 2 to ${MAX_ENCLOSURE_SURFACES} surfaces`);
  }
  let knownTemperatures = 0;
  surfaces.forEach((s, i) => {
    const field = `surfaces[${i}]`;
    if (s === null || typeof s !== "object") throw new ThermalInputError(field, s, "a surface { area_m2, emissivity, … }");
    requireAbove(`${field}.area_m2`, s.area_m2, 0, "m²");
    requireEmissivityValue(`${field}.emissivity`, s.emissivity);
    const conditions = [s.temperature_K !== undefined, s.netHeat_W !== undefined, s.reradiating === true].filter(Boolean).length;
    if (conditions !== 1) {
      throw new ThermalInputError(field, `${conditions} boundary conditions`, "exactly one of temperature_K, netHeat_W or reradiating: true");
    }
    if (s.temperature_K !== undefined) {
      requireAbove(`${field}.temperature_K`, s.temperature_K, 0, "K");
      knownTemperatures++;
    }
    if (s.netHeat_W !== undefined && (typeof s.netHeat_W !== "number" || !Number.isFinite(s.netHeat_W))) {
      throw new ThermalInputError(`${field}.netHeat_W`, s.netHeat_W, "a finite number of watts (positive leaving the surface)");
    }
  });
  if (knownTemperatures === 0) {
    throw new ThermalInputError("surfaces", "no surface with temperature_K", "at least one surface with a known temperature_K");
  }
  return surfaces;
}
