import { formatSource, type EmissivitySpec, type MaterialProperties, type MaterialVersion } from "../../../../shared/schemas/material";
import { CRYOGENS, SUPPORT_MATERIALS } from "../../../../shared/thermal/index";
import { describeEmissivity, formatNumber, formatRange } from "../utils/library-text";

type Item = [term: string, value: string];

const withUnit = (value: number | null | undefined, unit: string) => (value === null || value === undefined ? "—" : `${formatNumber(value)} ${unit}`);

function spec(label: string, s: EmissivitySpec): Item[] {
  const items: Item[] = [[`${label} emissivity`, describeEmissivity(s.model)]];
  if (s.low) items.push([`${label}, low band`, describeEmissivity(s.low)]);
  if (s.high) items.push([`${label}, high band`, describeEmissivity(s.high)]);
  return items;
}

/** The kind's own properties in words and units (SI, as the engine takes them). */
function propertyItems(p: MaterialProperties): Item[] {
  switch (p.kind) {
    case "reflector":
      return [["Form", p.form === "film" ? "Film" : "Foil"], ...spec("Warm face", p.warmSide), ...spec("Cold face", p.coldSide)];
    case "wall-finish":
      return spec("Surface", p.surface);
    case "spacer": {
      const s = p.solidConduction;
      const conduction = !s
        ? "not given"
        : "conductance_W_per_m2_K" in s
          ? `${formatNumber(s.conductance_W_per_m2_K)} W/(m²·K) per gap${s.referenceMeanTemperature_K !== undefined ? ` at a mean ${formatNumber(s.referenceMeanTemperature_K)} K (scales with T)` : ""}${s.referenceLayerDensity_per_cm !== undefined ? ` and ${formatNumber(s.referenceLayerDensity_per_cm)} layers/cm (scales as density^${formatNumber(s.layerDensityExponent ?? 0)})` : ""}`
          : `${formatNumber(s.conductivity_W_per_m_K)} W/(m·K) over ${formatNumber(s.thickness_m)} m${s.contactFactor !== undefined ? `, contact factor ${formatNumber(s.contactFactor)}` : ""}`;
      return [["Form", p.form[0].toUpperCase() + p.form.slice(1)], ["Solid conduction", conduction]];
    }
    case "support-material": {
      const fit = SUPPORT_MATERIALS[p.supportMaterial];
      return [["Conductivity fit", fit.label], ["Fit's range", `${fit.validRange_K[0]} to ${fit.validRange_K[1]} K`], ["Fit source", fit.fitSource]];
    }
    case "correlation-set": {
      const c = p.coefficients;
      return [
        ["Based on", p.basedOn ?? "—"],
        ["Solid coefficient C_s", formatNumber(c.solid)],
        ["Layer-density exponent", formatNumber(c.solidExponent)],
        ["Radiation coefficient C_r", formatNumber(c.radiation)],
        ["Gas coefficient C_g", formatNumber(c.gas)],
        ["Solid temperature term", c.solidTemperatureTerm === "polyester-conductivity" ? "Polyester conductivity" : "Mean temperature"],
        ["Fitted emissivity", p.fittedEmissivity == null ? "—" : formatNumber(p.fittedEmissivity)],
      ];
    }
    case "cryogen":
      return [
        ["Fluid", CRYOGENS[p.fluid].label],
        ["Saturation temperature (1 atm)", withUnit(p.saturationTemperature_K, "K")],
        ["Latent heat", withUnit(p.latentHeat_J_per_kg / 1000, "kJ/kg")],
        ["Liquid density", withUnit(p.liquidDensity_kg_per_m3, "kg/m³")],
        ["Vapour density", withUnit(p.vapourDensity_kg_per_m3, "kg/m³")],
        ["Molar mass", withUnit(p.molarMass_kg_per_mol * 1000, "g/mol")],
      ];
  }
}

/** One version's numbers, each with its unit, then where they come from. */
export function VersionProperties({ version }: { version: MaterialVersion }) {
  const items: Item[] = [
    ...propertyItems(version.properties),
    ["Valid range", formatRange(version.validRange_K)],
    ["Thickness", withUnit(version.thickness_m, "m")],
    ["Areal mass", withUnit(version.arealMass_kg_per_m2, "kg/m²")],
    ["Cost", version.cost_per_m2 === null ? "—" : `${formatNumber(version.cost_per_m2)} per m²`],
    ["Source", formatSource(version.source)],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[minmax(10rem,auto)_1fr]" aria-label={`Properties of version ${version.version}`}>
      {items.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-300">{term}</dt>
          <dd className="text-ink-50">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
