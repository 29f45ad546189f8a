import { formatSource, type MaterialVersion } from "../../../../shared/schemas/material";
import type { Emissivity } from "../../../../shared/thermal/index";
import { describeEmissivity, formatNumber, formatRange } from "./library-text";

export type FieldChange = { field: string; from: string; to: string };

const EMPTY = "—";

/** Emissivity models are compared as a whole: a table with one point moved is one change. */
const isEmissivityKey = (key: string) => key === "model" || key === "low" || key === "high";

function show(value: unknown, key: string): string {
  if (value === null || value === undefined) return EMPTY;
  if (isEmissivityKey(key)) return describeEmissivity(value as Emissivity);
  if (typeof value === "number") return formatNumber(value, 6);
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "string") return value;
  return JSON.stringify(value);
}

/** Leaf fields of a properties object as dotted names, stopping at emissivity models. */
function flatten(value: unknown, prefix: string, out: Map<string, string>) {
  const key = prefix.split(".").pop() ?? prefix;
  if (value !== null && typeof value === "object" && !Array.isArray(value) && !isEmissivityKey(key)) {
    for (const [k, v] of Object.entries(value)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
    return;
  }
  out.set(prefix, show(value, key));
}

function fieldsOf(v: MaterialVersion): Map<string, string> {
  const out = new Map<string, string>();
  out.set("name", v.name);
  flatten(v.properties, "properties", out);
  out.set("validRange_K", formatRange(v.validRange_K));
  out.set("thickness_m", show(v.thickness_m, "thickness_m"));
  out.set("arealMass_kg_per_m2", show(v.arealMass_kg_per_m2, "arealMass_kg_per_m2"));
  out.set("cost_per_m2", show(v.cost_per_m2, "cost_per_m2"));
  out.set("source", formatSource(v.source));
  return out;
}

/**
 * What changed from one version to another: every field whose shown value differs, old → new.
 * Pure, so the page and a test can both trust it; bookkeeping (status, who, when) is left out.
 */
export function diffVersions(from: MaterialVersion, to: MaterialVersion): FieldChange[] {
  const a = fieldsOf(from);
  const b = fieldsOf(to);
  const names = [...new Set([...a.keys(), ...b.keys()])];
  return names
    .map((field) => ({ field, from: a.get(field) ?? EMPTY, to: b.get(field) ?? EMPTY }))
    .filter((change) => change.from !== change.to);
}
