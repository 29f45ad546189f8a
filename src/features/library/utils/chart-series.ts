import type { EmissivitySpec, MaterialProperties } from "../../../../shared/schemas/material";
// The barrel leaves out the unchecked evaluation on purpose; the schema has validated these models.
import { evaluateEmissivity } from "../../../../shared/thermal/emissivity";
import { EXTRAPOLATION_LIMIT_K, SUPPORT_MATERIALS, thermalConductivity, type Emissivity } from "../../../../shared/thermal/index";

export type Row = { temperature_K: number } & Record<string, number>;
export type Series = { key: string; label: string; band?: "low" | "high"; face: number };
export type Marks = { key: string; label: string; face: number; points: { temperature_K: number; value: number }[] };

export type ChartSeries =
  | { quantity: "emissivity"; rows: Row[]; lines: Series[]; marks: Marks[]; logScale: false; range: [number, number] }
  | { quantity: "conductivity"; rows: Row[]; lines: Series[]; marks: Marks[]; logScale: boolean; range: [number, number]; fitLabel: string; ticks?: number[] };

/** 1-2-5 steps on a log axis, inside [min, max] and with both ends, so the labels stay readable. */
export function logTicks(min: number, max: number): number[] {
  const out = new Set<number>([min, max]);
  for (let decade = 10 ** Math.floor(Math.log10(min)); decade <= max; decade *= 10) {
    for (const step of [1, 2, 5]) {
      const t = Number((step * decade).toPrecision(3));
      if (t > min * 1.15 && t < max / 1.15) out.add(t);
    }
  }
  return [...out].sort((a, b) => a - b);
}

const SAMPLES = 64;

/** Log spacing when the range spans a decade or more (4 K to 300 K), so the cold end has points. */
function temperatures(min: number, max: number, log: boolean, extra: number[] = []): number[] {
  const out = Array.from({ length: SAMPLES }, (_, i) => {
    const f = i / (SAMPLES - 1);
    return log ? min * (max / min) ** f : min + (max - min) * f;
  });
  return [...new Set([...out, ...extra.filter((t) => t > min && t < max)])].sort((a, b) => a - b);
}

const tableMarks = (model: Emissivity, min: number, max: number) =>
  typeof model === "object" && model.kind === "table"
    ? model.points.filter(([t]) => t >= min && t <= max).map(([temperature_K, value]) => ({ temperature_K, value }))
    : [];

function faces(p: MaterialProperties): [string, string, EmissivitySpec][] {
  // Metallized on both sides usually means one model twice: draw it once, named for both.
  if (p.kind === "reflector" && JSON.stringify(p.warmSide) === JSON.stringify(p.coldSide)) return [["warmSide", "Both faces", p.warmSide]];
  if (p.kind === "reflector") return [["warmSide", "Warm face", p.warmSide], ["coldSide", "Cold face", p.coldSide]];
  if (p.kind === "wall-finish") return [["surface", "Surface", p.surface]];
  return [];
}

/**
 * What the entry's chart draws over its valid range: emissivity of each face (with its band)
 * for reflectors and wall finishes, or the engine's conductivity fit for a support material.
 * Null for kinds with nothing to plot against temperature, or a single-temperature range.
 */
export function chartSeries(p: MaterialProperties, range: { min: number; max: number }): ChartSeries | null {
  if (p.kind === "support-material") {
    const fit = SUPPORT_MATERIALS[p.supportMaterial];
    // The fit is refused below its lower limit and above the extrapolation limit.
    const min = Math.max(range.min, fit.validRange_K[0]);
    const max = Math.min(range.max, EXTRAPOLATION_LIMIT_K);
    if (!(max > min)) return null;
    const log = max / min >= 10;
    const rows = temperatures(min, max, log).map((T) => ({ temperature_K: T, k: thermalConductivity(p.supportMaterial, T) }));
    return { quantity: "conductivity", rows, lines: [{ key: "k", label: "Thermal conductivity", face: 0 }], marks: [], logScale: log, range: [min, max], fitLabel: fit.fitSource, ticks: log ? logTicks(min, max) : undefined };
  }
  const list = faces(p);
  if (list.length === 0 || !(range.max > range.min)) return null;
  const tabulated = list.flatMap(([, , spec]) => [spec.model, spec.low, spec.high]).flatMap((m) => (m ? tableMarks(m, range.min, range.max).map((x) => x.temperature_K) : []));
  const lines: Series[] = [];
  const marks: Marks[] = [];
  list.forEach(([key, label, spec], face) => {
    lines.push({ key, label, face });
    if (spec.low) lines.push({ key: `${key}Low`, label: `${label}, low band`, band: "low", face });
    if (spec.high) lines.push({ key: `${key}High`, label: `${label}, high band`, band: "high", face });
    const points = tableMarks(spec.model, range.min, range.max);
    if (points.length > 0) marks.push({ key: `${key}Points`, label: `${label}, tabulated points`, face, points });
  });
  const rows = temperatures(range.min, range.max, false, tabulated).map((T) => {
    const row: Row = { temperature_K: T };
    for (const [key, , spec] of list) {
      row[key] = evaluateEmissivity(spec.model, T);
      if (spec.low) row[`${key}Low`] = evaluateEmissivity(spec.low, T);
      if (spec.high) row[`${key}High`] = evaluateEmissivity(spec.high, T);
    }
    return row;
  });
  return { quantity: "emissivity", rows, lines, marks, logScale: false, range: [range.min, range.max] };
}
