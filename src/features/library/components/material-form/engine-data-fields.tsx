import { useFormContext } from "react-hook-form";
import {
  CORRELATION_SETS,
  CRYOGEN_IDS,
  CRYOGENS,
  EXTRAPOLATION_LIMIT_K,
  SUPPORT_MATERIAL_IDS,
  SUPPORT_MATERIALS,
  type CryogenId,
  type SupportMaterial,
} from "../../../../../shared/thermal/index";
import { SelectField, TextField } from "../../../../components/ui/field";
import type { MaterialFormValues } from "./form-values";
import { useErrorOf } from "./use-error-of";

/** A support material points at one of the engine's conductivity fits; picking one fills its range. */
export function SupportFields() {
  const { register, setValue } = useFormContext<MaterialFormValues>();
  const errorOf = useErrorOf();
  const field = register("properties.supportMaterial", {
    onChange: (event: React.ChangeEvent<HTMLSelectElement>) => {
      const [min, max] = SUPPORT_MATERIALS[event.target.value as SupportMaterial].validRange_K;
      setValue("validRange_K", { min: String(min), max: String(max) });
    },
  });
  return (
    <SelectField label="Conductivity fit" hint={`The engine's fits; each holds from its lower limit to 300 K, extrapolated to ${EXTRAPOLATION_LIMIT_K} K.`} error={errorOf("properties.supportMaterial")} {...field}>
      {SUPPORT_MATERIAL_IDS.map((id) => (
        <option key={id} value={id}>{SUPPORT_MATERIALS[id].label} ({SUPPORT_MATERIALS[id].validRange_K.join(" to ")} K)</option>
      ))}
    </SelectField>
  );
}

/** The multilayer correlation's coefficients; starting from one of the engine's sets fills them in. */
export function CorrelationFields() {
  const { register, setValue } = useFormContext<MaterialFormValues>();
  const errorOf = useErrorOf();
  const basedOn = register("properties.basedOn", {
    onChange: (event: React.ChangeEvent<HTMLSelectElement>) => {
      const set = CORRELATION_SETS.find((s) => s.id === event.target.value);
      if (!set) return;
      const c = set.coefficients;
      setValue("properties.coefficients", { solid: String(c.solid), solidExponent: String(c.solidExponent), radiation: String(c.radiation), gas: String(c.gas), solidTemperatureTerm: c.solidTemperatureTerm ?? "" });
      setValue("properties.fittedEmissivity", String(set.emissivity));
    },
  });
  const c = (name: "solid" | "solidExponent" | "radiation" | "gas", label: string) => (
    <TextField label={label} inputMode="decimal" error={errorOf(`properties.coefficients.${name}`)} {...register(`properties.coefficients.${name}`)} />
  );
  return (
    <div className="space-y-4">
      <SelectField label="Based on the engine's set" error={errorOf("properties.basedOn")} {...basedOn}>
        <option value="">None (own coefficients)</option>
        {CORRELATION_SETS.map((s) => (
          <option key={s.id} value={s.id}>{s.label}</option>
        ))}
      </SelectField>
      <div className="grid gap-3 sm:grid-cols-2">
        {c("solid", "Solid coefficient C_s (0 to 1)")}
        {c("solidExponent", "Layer-density exponent (0 to 10)")}
        {c("radiation", "Radiation coefficient C_r (0 to 1)")}
        {c("gas", "Gas coefficient C_g (0 to 10⁷)")}
      </div>
      <SelectField label="Solid temperature term" error={errorOf("properties.coefficients.solidTemperatureTerm")} {...register("properties.coefficients.solidTemperatureTerm")}>
        <option value="">Not set (the engine uses the mean temperature)</option>
        <option value="mean-temperature">Mean temperature</option>
        <option value="polyester-conductivity">Polyester conductivity</option>
      </SelectField>
      <TextField label="Fitted emissivity (optional, above 0 to 1)" inputMode="decimal" error={errorOf("properties.fittedEmissivity")} {...register("properties.fittedEmissivity")} />
    </div>
  );
}

const FLUID_FIELDS = [
  ["saturationTemperature_K", "Saturation temperature at 1 atm, K (above 0, at most 300)"],
  ["latentHeat_J_per_kg", "Latent heat, J/kg"],
  ["liquidDensity_kg_per_m3", "Liquid density, kg/m³"],
  ["vapourDensity_kg_per_m3", "Saturated vapour density, kg/m³"],
  ["molarMass_kg_per_mol", "Molar mass, kg/mol"],
] as const;

/** A cryogen's saturated properties at 1 atm; picking the fluid starts from the engine's table. */
export function CryogenFields() {
  const { register, setValue } = useFormContext<MaterialFormValues>();
  const errorOf = useErrorOf();
  const fluid = register("properties.fluid", {
    onChange: (event: React.ChangeEvent<HTMLSelectElement>) => {
      const f = CRYOGENS[event.target.value as CryogenId];
      for (const [key] of FLUID_FIELDS) setValue(`properties.${key}`, String(f[key]));
      setValue("validRange_K", { min: String(f.saturationTemperature_K), max: String(f.saturationTemperature_K) });
    },
  });
  return (
    <div className="space-y-4">
      <SelectField label="Fluid" error={errorOf("properties.fluid")} {...fluid}>
        {CRYOGEN_IDS.map((id) => (
          <option key={id} value={id}>{CRYOGENS[id].label}</option>
        ))}
      </SelectField>
      <div className="grid gap-3 sm:grid-cols-2">
        {FLUID_FIELDS.map(([key, label]) => (
          <TextField key={key} label={label} inputMode="decimal" error={errorOf(`properties.${key}`)} {...register(`properties.${key}`)} />
        ))}
      </div>
    </div>
  );
}
