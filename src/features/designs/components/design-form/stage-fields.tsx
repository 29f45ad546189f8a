import { useFormContext, useWatch } from "react-hook-form";
import type { DesignContentInput } from "../../../../../shared/schemas/design";
import { TextField } from "../../../../components/ui/field";
import { formatQuantity } from "../../../../lib/format-quantity";
import { useUnitSystem } from "../../../../lib/unit-system";
import { MaterialField } from "./material-field";
import { QuantityField } from "./quantity-field";

/**
 * A cooled stage between two blocks (a liquid-nitrogen jacket, a cryocooler stage). With a
 * cryogen its temperature is the cryogen's boiling point, written into the form so the saved
 * content stays self-explanatory.
 */
export function StageFields({ index }: { index: number }) {
  const { control, register, setValue, formState } = useFormContext<DesignContentInput>();
  const system = useUnitSystem();
  const cryogen = useWatch({ control, name: `layup.${index}.cryogen` as const });
  const temperature = useWatch({ control, name: `layup.${index}.temperature_K` as const });
  const errors = formState.errors.layup?.[index] as { label?: { message?: string } } | undefined;

  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <TextField label="Stage label" error={errors?.label?.message} {...register(`layup.${index}.label`)} />
      <MaterialField
        name={`layup.${index}.cryogen`}
        label="Cooled by"
        kind="cryogen"
        noneLabel="A fixed temperature (no cryogen)"
        onPicked={(entry) => {
          if (entry?.shown.properties.kind === "cryogen") setValue(`layup.${index}.temperature_K`, entry.shown.properties.saturationTemperature_K, { shouldValidate: true });
        }}
      />
      {cryogen == null ? (
        <QuantityField name={`layup.${index}.temperature_K`} label="Stage temperature" kind="temperature" />
      ) : (
        <p className="self-end pb-2 text-sm text-ink-300">
          At {formatQuantity("temperature", typeof temperature === "number" ? temperature : null, system, 5)}, the cryogen's boiling point at 1 atm.
        </p>
      )}
      <MaterialField name={`layup.${index}.finish`} label="Stage finish" kind="wall-finish" />
      {cryogen != null ? <QuantityField name={`layup.${index}.capacity_L`} label="Stage bath capacity" kind="volume" empty={null} hint="Optional; gives this stage's hold time." /> : null}
    </div>
  );
}
