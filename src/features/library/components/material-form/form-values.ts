import type { MaterialKind, MaterialSource } from "../../../../../shared/schemas/material";
import type { CryogenId, SupportMaterial } from "../../../../../shared/thermal/index";

/**
 * The form's own shape. Numbers are kept as the text typed (so a bad entry stays on screen and
 * the shared schema, not the browser, says what is wrong); toInput builds the contract's shape.
 * Paths match the contract's (properties.warmSide.model.reference …) so every error, from the
 * schema here or from the server, lands beside its input. One wide properties object holds every
 * kind's fields, so switching kind in a new entry loses nothing typed.
 */
export type ModelForm = {
  kind: "constant" | "power" | "table";
  value: string;
  reference: string;
  referenceTemperature_K: string;
  exponent: string;
  points: { temperature_K: string; emissivity: string }[];
};
export type SpecForm = { model: ModelForm; banded: boolean; low: ModelForm; high: ModelForm };
export type SpecPath = "properties.warmSide" | "properties.coldSide" | "properties.surface";
export type ModelPath = `${SpecPath}.${"model" | "low" | "high"}`;

export type MaterialFormValues = {
  name: string;
  properties: {
    kind: MaterialKind;
    form: string;
    /** Reflectors metallized on both faces: one model serves both (a form-only switch). */
    sameFaces: boolean;
    warmSide: SpecForm;
    coldSide: SpecForm;
    surface: SpecForm;
    solidConduction: {
      mode: "none" | "conductance" | "conductivity";
      conductance_W_per_m2_K: string;
      referenceMeanTemperature_K: string;
      referenceLayerDensity_per_cm: string;
      layerDensityExponent: string;
      conductivity_W_per_m_K: string;
      thickness_m: string;
      contactFactor: string;
    };
    supportMaterial: SupportMaterial;
    basedOn: string;
    coefficients: { solid: string; solidExponent: string; radiation: string; gas: string; solidTemperatureTerm: "" | "mean-temperature" | "polyester-conductivity" };
    fittedEmissivity: string;
    fluid: CryogenId;
    saturationTemperature_K: string;
    latentHeat_J_per_kg: string;
    liquidDensity_kg_per_m3: string;
    vapourDensity_kg_per_m3: string;
    molarMass_kg_per_mol: string;
  };
  validRange_K: { min: string; max: string };
  thickness_m: string;
  arealMass_kg_per_m2: string;
  cost_per_m2: string;
  source: { type: MaterialSource["type"]; author: string; title: string; year: string; location: string; fromMemory: boolean; test: string; note: string };
  changeNote: string;
};

export const text = (n: number | null | undefined) => (n === null || n === undefined ? "" : String(n));
/** "" is "not given"; anything else goes to the schema as a number (NaN is refused there, by name). */
const num = (s: string) => (s.trim() === "" ? undefined : Number(s));
const orNull = (s: string) => num(s) ?? null;
const textOrNull = (s: string) => (s.trim() === "" ? null : s);

export const emptyModel = (): ModelForm => ({ kind: "constant", value: "", reference: "", referenceTemperature_K: "300", exponent: "0.5", points: [{ temperature_K: "", emissivity: "" }, { temperature_K: "", emissivity: "" }] });
const emptySpec = (): SpecForm => ({ model: emptyModel(), banded: false, low: emptyModel(), high: emptyModel() });

export function emptyValues(kind: MaterialKind = "reflector"): MaterialFormValues {
  return {
    name: "",
    properties: {
      kind,
      form: kind === "spacer" ? "netting" : "film",
      sameFaces: true,
      warmSide: emptySpec(),
      coldSide: emptySpec(),
      surface: emptySpec(),
      solidConduction: { mode: "none", conductance_W_per_m2_K: "", referenceMeanTemperature_K: "", referenceLayerDensity_per_cm: "", layerDensityExponent: "", conductivity_W_per_m_K: "", thickness_m: "", contactFactor: "" },
      supportMaterial: "stainless-304",
      basedOn: "",
      coefficients: { solid: "", solidExponent: "", radiation: "", gas: "", solidTemperatureTerm: "" },
      fittedEmissivity: "",
      fluid: "nitrogen",
      saturationTemperature_K: "",
      latentHeat_J_per_kg: "",
      liquidDensity_kg_per_m3: "",
      vapourDensity_kg_per_m3: "",
      molarMass_kg_per_mol: "",
    },
    validRange_K: { min: "", max: "" },
    thickness_m: "",
    arealMass_kg_per_m2: "",
    cost_per_m2: "",
    source: { type: "citation", author: "", title: "", year: "", location: "", fromMemory: false, test: "", note: "" },
    changeNote: "",
  };
}

function toModel(m: ModelForm): unknown {
  if (m.kind === "constant") return num(m.value);
  if (m.kind === "power") return { kind: "power", reference: num(m.reference), referenceTemperature_K: num(m.referenceTemperature_K), exponent: num(m.exponent) };
  return { kind: "table", points: m.points.map((p) => [num(p.temperature_K), num(p.emissivity)]) };
}
const toSpec = (s: SpecForm) => ({ model: toModel(s.model), low: s.banded ? toModel(s.low) : null, high: s.banded ? toModel(s.high) : null });

function toProperties(p: MaterialFormValues["properties"]): unknown {
  switch (p.kind) {
    case "reflector":
      return { kind: p.kind, form: p.form, warmSide: toSpec(p.warmSide), coldSide: toSpec(p.sameFaces ? p.warmSide : p.coldSide) };
    case "wall-finish":
      return { kind: p.kind, surface: toSpec(p.surface) };
    case "spacer": {
      const s = p.solidConduction;
      const solidConduction =
        s.mode === "none" ? null
        : s.mode === "conductance"
          ? {
              conductance_W_per_m2_K: num(s.conductance_W_per_m2_K),
              referenceMeanTemperature_K: num(s.referenceMeanTemperature_K),
              referenceLayerDensity_per_cm: num(s.referenceLayerDensity_per_cm),
              layerDensityExponent: num(s.layerDensityExponent),
            }
        : { conductivity_W_per_m_K: num(s.conductivity_W_per_m_K), thickness_m: num(s.thickness_m), contactFactor: num(s.contactFactor) };
      return { kind: p.kind, form: p.form, solidConduction };
    }
    case "support-material":
      return { kind: p.kind, supportMaterial: p.supportMaterial };
    case "correlation-set": {
      const c = p.coefficients;
      const coefficients = { solid: num(c.solid), solidExponent: num(c.solidExponent), radiation: num(c.radiation), gas: num(c.gas), solidTemperatureTerm: c.solidTemperatureTerm || undefined };
      return { kind: p.kind, basedOn: textOrNull(p.basedOn), coefficients, fittedEmissivity: orNull(p.fittedEmissivity) };
    }
    case "cryogen":
      return {
        kind: p.kind,
        fluid: p.fluid,
        saturationTemperature_K: num(p.saturationTemperature_K),
        latentHeat_J_per_kg: num(p.latentHeat_J_per_kg),
        liquidDensity_kg_per_m3: num(p.liquidDensity_kg_per_m3),
        vapourDensity_kg_per_m3: num(p.vapourDensity_kg_per_m3),
        molarMass_kg_per_mol: num(p.molarMass_kg_per_mol),
      };
  }
}

function toSource(s: MaterialFormValues["source"]): unknown {
  if (s.type === "measured") return { type: s.type, test: s.test, note: textOrNull(s.note) };
  if (s.type === "memory") return { type: s.type, note: textOrNull(s.note) };
  return { type: s.type, author: s.author, title: s.title, year: orNull(s.year), location: textOrNull(s.location), fromMemory: s.fromMemory, note: textOrNull(s.note) };
}

/** The contract's input, unvalidated: the shared schema checks it next. */
export function toInput(v: MaterialFormValues): unknown {
  return {
    name: v.name,
    properties: toProperties(v.properties),
    validRange_K: { min: num(v.validRange_K.min), max: num(v.validRange_K.max) },
    thickness_m: orNull(v.thickness_m),
    arealMass_kg_per_m2: orNull(v.arealMass_kg_per_m2),
    cost_per_m2: orNull(v.cost_per_m2),
    source: toSource(v.source),
    changeNote: textOrNull(v.changeNote),
  };
}
