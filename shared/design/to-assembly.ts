import type { AssemblyDesign, LayupItem, Reflector } from "../thermal/assembly-design";
import type { MaterialProperties } from "../schemas/material";
import type { DesignContent, MaterialRef } from "../schemas/design";

/**
 * The Design form's content → the engine's AssemblyDesign, with every library reference
 * resolved to the exact version's properties. Pure, shared by the server's saved prediction and
 * the stateless estimate, so the two cannot disagree.
 */
export interface ResolvedMaterial {
  materialId: string;
  version: number;
  name: string;
  properties: MaterialProperties;
  arealMass_kg_per_m2: number | null;
  cost_per_m2: number | null;
  thickness_m: number | null;
  source: string;
}

export const materialKey = (ref: MaterialRef) => `${ref.materialId}@${ref.version}`;

/** Thrown when a reference is missing or of the wrong kind; `field` is the form path. */
export class MaterialReferenceError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "MaterialReferenceError";
  }
}

type Lookup = (ref: MaterialRef) => ResolvedMaterial | undefined;

function pick<K extends MaterialProperties["kind"]>(lookup: Lookup, ref: MaterialRef, kind: K, field: string) {
  const found = lookup(ref);
  if (!found) throw new MaterialReferenceError(field, `${field} points at library entry ${ref.materialId} version ${ref.version}, which is not an approved library version this organization can use`);
  if (found.properties.kind !== kind) throw new MaterialReferenceError(field, `${field} must be a ${kind} entry, but "${found.name}" is a ${found.properties.kind}`);
  return found.properties as Extract<MaterialProperties, { kind: K }>;
}

function surface(lookup: Lookup, ref: MaterialRef, field: string) {
  return pick(lookup, ref, "wall-finish", field).surface.model;
}

function reflectorOf(lookup: Lookup, ref: MaterialRef, field: string): Reflector {
  const r = pick(lookup, ref, "reflector", field);
  const reflector: Reflector = { warmSide: r.warmSide.model, coldSide: r.coldSide.model };
  // The band uses a face's low/high model where given, else its nominal one.
  if (r.warmSide.low != null || r.coldSide.low != null) reflector.low = { warmSide: r.warmSide.low ?? r.warmSide.model, coldSide: r.coldSide.low ?? r.coldSide.model };
  if (r.warmSide.high != null || r.coldSide.high != null) reflector.high = { warmSide: r.warmSide.high ?? r.warmSide.model, coldSide: r.coldSide.high ?? r.coldSide.model };
  return reflector;
}

export function toAssembly(content: DesignContent, lookup: Lookup): AssemblyDesign {
  const cold = content.cold;
  const coldCryogen = cold.cryogen ? pick(lookup, cold.cryogen, "cryogen", "cold.cryogen") : null;

  const layup: LayupItem[] = content.layup.map((item, i): LayupItem => {
    const at = `layup.${i}`;
    if (item.kind === "stage") {
      const cryogen = item.cryogen ? pick(lookup, item.cryogen, "cryogen", `${at}.cryogen`) : null;
      return {
        kind: "stage",
        label: item.label,
        temperature_K: cryogen ? cryogen.saturationTemperature_K : item.temperature_K,
        emissivity: surface(lookup, item.finish, `${at}.finish`),
        ...(cryogen ? { cryogen: cryogen.fluid } : {}),
        ...(item.capacity_L != null ? { capacity_L: item.capacity_L } : {}),
      };
    }
    const block: LayupItem = {
      kind: "block",
      label: item.label,
      layers: item.layers,
      reflector: reflectorOf(lookup, item.reflector, `${at}.reflector`),
      model: item.model,
      layerDensity_per_cm: item.layerDensity_per_cm,
      degradationFactor: item.degradationFactor,
    };
    if (item.model === "layers") {
      if (!item.spacer) throw new MaterialReferenceError(`${at}.spacer`, `${at}.spacer is required for the layer-by-layer model`);
      const spacer = pick(lookup, item.spacer, "spacer", `${at}.spacer`);
      if (!spacer.solidConduction) throw new MaterialReferenceError(`${at}.spacer`, `${at}.spacer has no solid-conduction data, which the layer-by-layer model needs`);
      block.spacer = spacer.solidConduction;
    }
    if (item.model === "correlation") {
      if (!item.correlationSet) throw new MaterialReferenceError(`${at}.correlationSet`, `${at}.correlationSet is required for the correlation model`);
      block.coefficients = pick(lookup, item.correlationSet, "correlation-set", `${at}.correlationSet`).coefficients;
    }
    return block;
  });

  return {
    geometry: content.geometry,
    warm: { temperature_K: content.warm.temperature_K, emissivity: surface(lookup, content.warm.finish, "warm.finish") },
    cold: {
      temperature_K: coldCryogen ? coldCryogen.saturationTemperature_K : (cold.temperature_K as number),
      emissivity: surface(lookup, cold.finish, "cold.finish"),
      ...(coldCryogen ? { cryogen: coldCryogen.fluid } : {}),
      ...(cold.capacity_L != null ? { capacity_L: cold.capacity_L } : {}),
      fillFraction: cold.fillFraction,
      minimumFraction: cold.minimumFraction,
    },
    layup,
    supports: content.supports.map((s, i) => ({
      label: s.label,
      material: pick(lookup, s.material, "support-material", `supports.${i}.material`).supportMaterial,
      area_m2: s.area_m2,
      length_m: s.length_m,
      count: s.count,
      from: s.from,
      to: s.to,
    })),
    vacuum: { pressure_Pa: content.vacuum.pressure_Pa, gas: content.vacuum.gas },
  };
}

/** Every library reference in a design, once each: what the server must load. */
export function materialRefsOf(content: DesignContent): MaterialRef[] {
  const refs: MaterialRef[] = [content.warm.finish, content.cold.finish];
  if (content.cold.cryogen) refs.push(content.cold.cryogen);
  for (const item of content.layup) {
    if (item.kind === "stage") {
      refs.push(item.finish);
      if (item.cryogen) refs.push(item.cryogen);
    } else {
      refs.push(item.reflector);
      if (item.spacer) refs.push(item.spacer);
      if (item.correlationSet) refs.push(item.correlationSet);
    }
  }
  for (const s of content.supports) refs.push(s.material);
  const seen = new Map(refs.map((r) => [materialKey(r), r]));
  return [...seen.values()];
}
