import type { MaterialVersion } from "../../../../../shared/schemas/material";
import type { Emissivity } from "../../../../../shared/thermal/index";
import { emptyModel, emptyValues, text, type MaterialFormValues, type ModelForm, type SpecForm } from "./form-values";

function fromModel(model: Emissivity | null | undefined): ModelForm {
  const m = emptyModel();
  if (model === null || model === undefined) return m;
  if (typeof model === "number") return { ...m, kind: "constant", value: text(model) };
  if (model.kind === "power") return { ...m, kind: "power", reference: text(model.reference), referenceTemperature_K: text(model.referenceTemperature_K), exponent: text(model.exponent) };
  return { ...m, kind: "table", points: model.points.map(([t, e]) => ({ temperature_K: text(t), emissivity: text(e) })) };
}
const fromSpec = (s: { model: Emissivity; low?: Emissivity | null; high?: Emissivity | null }): SpecForm => ({
  model: fromModel(s.model),
  banded: Boolean(s.low || s.high),
  low: fromModel(s.low ?? s.model),
  high: fromModel(s.high ?? s.model),
});

/** A version as the form's starting point for a proposed change; the change note starts empty. */
export function fromVersion(v: MaterialVersion): MaterialFormValues {
  const values = emptyValues(v.properties.kind);
  const p = v.properties;
  const props = values.properties;
  if (p.kind === "reflector") Object.assign(props, { form: p.form, warmSide: fromSpec(p.warmSide), coldSide: fromSpec(p.coldSide), sameFaces: JSON.stringify(p.warmSide) === JSON.stringify(p.coldSide) });
  if (p.kind === "wall-finish") props.surface = fromSpec(p.surface);
  if (p.kind === "spacer") {
    const s = p.solidConduction;
    props.form = p.form;
    const empty = props.solidConduction;
    if (s && "conductance_W_per_m2_K" in s) {
      props.solidConduction = {
        ...empty,
        mode: "conductance",
        conductance_W_per_m2_K: text(s.conductance_W_per_m2_K),
        referenceMeanTemperature_K: text(s.referenceMeanTemperature_K),
        referenceLayerDensity_per_cm: text(s.referenceLayerDensity_per_cm),
        layerDensityExponent: text(s.layerDensityExponent),
      };
    } else if (s) {
      props.solidConduction = { ...empty, mode: "conductivity", conductivity_W_per_m_K: text(s.conductivity_W_per_m_K), thickness_m: text(s.thickness_m), contactFactor: text(s.contactFactor) };
    }
  }
  if (p.kind === "support-material") props.supportMaterial = p.supportMaterial;
  if (p.kind === "correlation-set") {
    const c = p.coefficients;
    Object.assign(props, { basedOn: p.basedOn ?? "", fittedEmissivity: text(p.fittedEmissivity), coefficients: { solid: text(c.solid), solidExponent: text(c.solidExponent), radiation: text(c.radiation), gas: text(c.gas), solidTemperatureTerm: c.solidTemperatureTerm ?? "" } });
  }
  if (p.kind === "cryogen") {
    Object.assign(props, {
      fluid: p.fluid,
      saturationTemperature_K: text(p.saturationTemperature_K),
      latentHeat_J_per_kg: text(p.latentHeat_J_per_kg),
      liquidDensity_kg_per_m3: text(p.liquidDensity_kg_per_m3),
      vapourDensity_kg_per_m3: text(p.vapourDensity_kg_per_m3),
      molarMass_kg_per_mol: text(p.molarMass_kg_per_mol),
    });
  }
  const s = v.source;
  values.source = {
    ...values.source,
    type: s.type,
    note: s.note ?? "",
    ...(s.type === "citation" ? { author: s.author, title: s.title, year: text(s.year), location: s.location ?? "", fromMemory: s.fromMemory } : {}),
    ...(s.type === "measured" ? { test: s.test } : {}),
  };
  return {
    ...values,
    name: v.name,
    validRange_K: { min: text(v.validRange_K.min), max: text(v.validRange_K.max) },
    thickness_m: text(v.thickness_m),
    arealMass_kg_per_m2: text(v.arealMass_kg_per_m2),
    cost_per_m2: text(v.cost_per_m2),
  };
}
