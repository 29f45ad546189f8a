import { useFormContext, useWatch } from "react-hook-form";
import { SelectField, TextField } from "../../../../components/ui/field";
import { GroupError } from "./emissivity-model-fields";
import type { MaterialFormValues } from "./form-values";
import { useErrorOf } from "./use-error-of";

/** A spacer: its form and, if known, its solid conduction per gap (either way the engine takes it). */
export function SpacerFields() {
  const { register, control } = useFormContext<MaterialFormValues>();
  const errorOf = useErrorOf();
  const mode = useWatch({ control, name: "properties.solidConduction.mode" });
  const at = (name: string) => errorOf(`properties.solidConduction.${name}`);
  return (
    <div className="space-y-4">
      <SelectField label="Form" error={errorOf("properties.form")} {...register("properties.form")}>
        <option value="netting">Netting</option>
        <option value="paper">Paper</option>
        <option value="other">Other</option>
      </SelectField>
      <fieldset className="space-y-3 rounded-md border border-ink-700 p-3">
        <legend className="px-1 text-sm font-medium text-ink-100">Solid conduction through the spacer</legend>
        <SelectField label="Given as" {...register("properties.solidConduction.mode")}>
          <option value="none">Not known (leave it out)</option>
          <option value="conductance">A conductance per gap</option>
          <option value="conductivity">A conductivity with thickness</option>
        </SelectField>
        {mode === "conductance" ? (
          <div className="space-y-3">
            <TextField label="Conductance per gap, W/(m²·K) (above 0, at most 1000)" inputMode="decimal" error={at("conductance_W_per_m2_K")} {...register("properties.solidConduction.conductance_W_per_m2_K")} />
            <p className="text-xs text-ink-300">
              Where it was measured, if known: the layer-by-layer model then scales it with each gap's mean temperature and with the block's
              layer density as (N̄/N̄ref)^a. Left empty, the conductance is used as it is everywhere.
            </p>
            <div className="grid gap-3 sm:grid-cols-3">
              <TextField label="At mean temperature, K (optional)" hint="Above 0, at most 400" inputMode="decimal" error={at("referenceMeanTemperature_K")} {...register("properties.solidConduction.referenceMeanTemperature_K")} />
              <TextField label="At layer density, layers/cm (optional)" hint="Above 0, at most 100" inputMode="decimal" error={at("referenceLayerDensity_per_cm")} {...register("properties.solidConduction.referenceLayerDensity_per_cm")} />
              <TextField label="Density exponent a (optional)" hint="0 to 5; with the layer density" inputMode="decimal" error={at("layerDensityExponent")} {...register("properties.solidConduction.layerDensityExponent")} />
            </div>
          </div>
        ) : null}
        {mode === "conductivity" ? (
          <div className="grid gap-3 sm:grid-cols-3">
            <TextField label="Conductivity, W/(m·K)" inputMode="decimal" error={at("conductivity_W_per_m_K")} {...register("properties.solidConduction.conductivity_W_per_m_K")} />
            <TextField label="Thickness, m" hint="Above 0, at most 0.01" inputMode="decimal" error={at("thickness_m")} {...register("properties.solidConduction.thickness_m")} />
            <TextField label="Contact factor (optional)" hint="A fraction, above 0 to 1" inputMode="decimal" error={at("contactFactor")} {...register("properties.solidConduction.contactFactor")} />
          </div>
        ) : null}
        <GroupError message={errorOf("properties.solidConduction")} />
      </fieldset>
    </div>
  );
}
