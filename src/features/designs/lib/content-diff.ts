import type { QuantityKind } from "../../../../shared/units";

export type Change = { path: string; before: unknown; after: unknown };

const isRef = (v: unknown): v is { materialId: string; version: number } =>
  typeof v === "object" && v !== null && "materialId" in v && "version" in v;

/** Flattens a revision's content to path → leaf, keeping a library pick as one leaf. */
function flatten(value: unknown, path: string, out: Map<string, unknown>) {
  if (value !== null && typeof value === "object" && !isRef(value)) {
    const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
    for (const [k, v] of entries) flatten(v, path ? `${path}.${k}` : k, out);
    if (entries.length === 0) out.set(path, Array.isArray(value) ? "(none)" : "");
    return;
  }
  out.set(path, value ?? null);
}

const same = (a: unknown, b: unknown) => (isRef(a) && isRef(b) ? a.materialId === b.materialId && a.version === b.version : a === b);

/** Field by field, in the newer content's order, then what was removed. */
export function diffContent(before: unknown, after: unknown): Change[] {
  const a = new Map<string, unknown>();
  const b = new Map<string, unknown>();
  flatten(before, "", a);
  flatten(after, "", b);
  const changes: Change[] = [];
  for (const [path, v] of b) if (!a.has(path) || !same(a.get(path), v)) changes.push({ path, before: a.has(path) ? a.get(path) : undefined, after: v });
  for (const [path, v] of a) if (!b.has(path)) changes.push({ path, before: v, after: undefined });
  return changes;
}

// The contract names every quantity with its unit suffix; the suffix picks the display unit.
const SUFFIX_KINDS: [RegExp, QuantityKind][] = [
  [/_K$/, "temperature"],
  [/_m2$/, "area"],
  [/_m$/, "length"],
  [/_L$/, "volume"],
  [/_Pa$/, "pressure"],
  [/_W$/, "heat"],
  [/_per_cm$/, "layerDensity"],
];

export function kindOfPath(path: string): QuantityKind | null {
  const leaf = path.split(".").at(-1) ?? "";
  return SUFFIX_KINDS.find(([re]) => re.test(leaf))?.[1] ?? null;
}

/** "layup.2.layers" → "layup · item 3 · layers": people count from 1. */
export function readablePath(path: string): string {
  return path
    .split(".")
    .map((part, i, all) => (/^\d+$/.test(part) ? `${all[i - 1] === "layup" ? "item" : "entry"} ${Number(part) + 1}` : part))
    .join(" · ");
}
