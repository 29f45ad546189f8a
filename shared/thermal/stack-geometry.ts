import { ThermalInputError, requireAbove } from "./errors";

/** The space between a warm and a cold wall; curved walls count their lateral surfaces only. */
export type StackGeometry =
  | { kind: "planar"; area_m2: number }
  | { kind: "cylinder"; coldRadius_m: number; warmRadius_m: number; length_m: number }
  | { kind: "sphere"; coldRadius_m: number; warmRadius_m: number };

/** Surfaces of a stack, node 0 = warm wall, 1…N = shields warm → cold, N + 1 = cold wall. */
export interface StackNodes {
  areas_m2: number[];
  /** Radii in the same order; empty for planar stacks. */
  radii_m: number[];
}

/**
 * Validates the geometry and the shields' radii and returns every surface's area.
 * Shield radii default to even spacing r_k = r_c + (r_w − r_c)·(N + 1 − k)/(N + 1), k = 1 the
 * warmest; given radii must nest strictly between the walls and fall from warm to cold.
 */
export function stackNodes(geometry: StackGeometry, shieldRadii_m: (number | undefined)[]): StackNodes {
  if (geometry === null || typeof geometry !== "object") {
    throw new ThermalInputError("geometry", geometry, 'an object with kind "planar", "cylinder" or "sphere"');
  }
  const n = shieldRadii_m.length;
  const areas_m2 = new Array<number>(n + 2).fill(0);
  if (geometry.kind === "planar") {
    const area_m2 = requireAbove("geometry.area_m2", geometry.area_m2, 0, "m²");
    shieldRadii_m.forEach((radius_m, i) => {
      if (radius_m !== undefined) {
        throw new ThermalInputError(`shields[${i}].radius_m`, radius_m, "left out for a planar geometry");
      }
    });
    areas_m2.fill(area_m2);
    return { areas_m2, radii_m: [] };
  }
  if (geometry.kind !== "cylinder" && geometry.kind !== "sphere") {
    throw new ThermalInputError("geometry.kind", (geometry as { kind?: unknown }).kind, '"planar", "cylinder" or "sphere"');
  }
  const cold_m = requireAbove("geometry.coldRadius_m", geometry.coldRadius_m, 0, "m");
  const warm_m = requireAbove("geometry.warmRadius_m", geometry.warmRadius_m, 0, "m");
  if (warm_m <= cold_m) {
    throw new ThermalInputError(
      "geometry.warmRadius_m",
      warm_m,
      `a radius above geometry.coldRadius_m (${cold_m} m): the cold wall is the inner one`,
    );
  }
  const length_m = geometry.kind === "cylinder" ? requireAbove("geometry.length_m", geometry.length_m, 0, "m") : 0;
  const radii_m = new Array<number>(n + 2).fill(0);
  radii_m[0] = warm_m;
  radii_m[n + 1] = cold_m;
  for (let k = 1; k <= n; k++) {
    const given = shieldRadii_m[k - 1];
    const field = `shields[${k - 1}].radius_m`;
    const radius_m = given === undefined ? cold_m + ((warm_m - cold_m) * (n + 1 - k)) / (n + 1) : requireAbove(field, given, 0, "m");
    if (radius_m <= cold_m || radius_m >= warm_m) {
      throw new ThermalInputError(field, radius_m, `a radius strictly between the cold wall's ${cold_m} m and the warm wall's ${warm_m} m`);
    }
    if (radius_m >= radii_m[k - 1]) {
      // Blame a radius the caller gave: a defaulted one is only wrong next to a given one.
      if (given === undefined && k > 1 && shieldRadii_m[k - 2] !== undefined) {
        throw new ThermalInputError(`shields[${k - 2}].radius_m`, radii_m[k - 1], `a radius above ${radius_m} m, the even spacing of the next shield (or give every radius)`);
      }
      throw new ThermalInputError(field, radius_m, `a radius below the warmer neighbour's ${radii_m[k - 1]} m (shields listed warm → cold)`);
    }
    radii_m[k] = radius_m;
  }
  for (let i = 0; i < n + 2; i++) {
    const r = radii_m[i];
    areas_m2[i] = geometry.kind === "cylinder" ? 2 * Math.PI * r * length_m : 4 * Math.PI * r * r;
  }
  return { areas_m2, radii_m };
}
