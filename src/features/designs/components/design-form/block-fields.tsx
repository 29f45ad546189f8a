import { useFormContext, useWatch } from "react-hook-form";
import type { DesignContentInput } from "../../../../../shared/schemas/design";
import { SelectField, TextField } from "../../../../components/ui/field";
import { MaterialField } from "./material-field";
import { QuantityField } from "./quantity-field";

const MODELS = [
  ["radiation", "Radiation only (ideal gray shields)"],
  ["correlation", "Correlation (empirical blanket fit)"],
  ["layers", "Layer by layer (radiation, spacer and gas)"],
] as const;

const DEGRADATION_HINT =
  "1 is the ideal blanket. Seams, penetrations and compression usually make a real blanket leak 1.5–3× its ideal figure.";

/** One block of the layup: "N layers of <reflector> with <spacer> at <layer density>", and how it is modelled. */
export function BlockFields({ index }: { index: number }) {
  const { control, register, formState } = useFormContext<DesignContentInput>();
  const model = useWatch({ control, name: `layup.${index}.model` as const });
  const errors = formState.errors.layup?.[index] as { label?: { message?: string }; model?: { message?: string } } | undefined;

  return (
    <div className="space-y-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <QuantityField name={`layup.${index}.layers`} label="Layers" kind={null} suffix="shields" />
        <MaterialField name={`layup.${index}.reflector`} label="Reflector" kind="reflector" />
        <MaterialField name={`layup.${index}.spacer`} label="Spacer" kind="spacer" noneLabel="No spacer" hint={model === "layers" ? "The layer-by-layer model needs a spacer with solid-conduction data." : undefined} />
        <QuantityField name={`layup.${index}.layerDensity_per_cm`} label="Layer density" kind="layerDensity" />
        <SelectField label="Model" error={errors?.model?.message} {...register(`layup.${index}.model`)}>
          {MODELS.map(([value, words]) => (
            <option key={value} value={value}>
              {words}
            </option>
          ))}
        </SelectField>
        {model === "correlation" ? <MaterialField name={`layup.${index}.correlationSet`} label="Correlation set" kind="correlation-set" /> : null}
        <QuantityField name={`layup.${index}.degradationFactor`} label="Degradation factor" kind={null} suffix="× ideal" hint={DEGRADATION_HINT} />
        <TextField label="Block label (optional)" error={errors?.label?.message} {...register(`layup.${index}.label`, { setValueAs: (v: string) => (v.trim() === "" ? undefined : v) })} />
      </div>
    </div>
  );
}
