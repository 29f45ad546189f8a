import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "../../../../components/ui/button";
import { SelectField, TextField } from "../../../../components/ui/field";
import { ErrorIcon } from "../../../../components/ui/icons";
import type { MaterialFormValues, ModelPath } from "./form-values";
import { useErrorOf } from "./use-error-of";

const MODEL_KINDS = { constant: "Constant", power: "Power law ε_ref·(T/T_ref)^n", table: "Table of (T, ε) points" } as const;

export function GroupError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <p className="flex items-start gap-1.5 text-sm text-fault-300">
      <ErrorIcon className="mt-0.5 size-4" />
      <span>{message}</span>
    </p>
  );
}

/** One emissivity model, as the engine takes it: a constant, a power law or a table of points. */
export function EmissivityModelFields({ path, label }: { path: ModelPath; label: string }) {
  const { register, control } = useFormContext<MaterialFormValues>();
  const errorOf = useErrorOf();
  const kind = useWatch({ control, name: `${path}.kind` });
  const points = useFieldArray({ control, name: `${path}.points` });
  const error = (name: string) => errorOf(`${path}${name}`);
  // A constant's error is on the model itself; for the other forms it speaks of the model as a whole.
  const whole = errorOf(path);

  return (
    <fieldset className="space-y-3 rounded-md border border-ink-700 p-3">
      <legend className="px-1 text-sm font-medium text-ink-100">{label}</legend>
      <SelectField label={`${label}: model`} {...register(`${path}.kind`)}>
        {Object.entries(MODEL_KINDS).map(([value, words]) => (
          <option key={value} value={value}>{words}</option>
        ))}
      </SelectField>
      {kind === "constant" ? (
        <TextField label={`${label}: emissivity (above 0, at most 1)`} inputMode="decimal" error={whole} {...register(`${path}.value`)} />
      ) : null}
      {kind === "power" ? (
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="ε_ref at the reference temperature" inputMode="decimal" error={error(".reference")} {...register(`${path}.reference`)} />
          <TextField label="Reference temperature T_ref, K" inputMode="decimal" error={error(".referenceTemperature_K")} {...register(`${path}.referenceTemperature_K`)} />
          <TextField label="Exponent n (−5 to 5)" hint="Metals: about 0.5" inputMode="decimal" error={error(".exponent")} {...register(`${path}.exponent`)} />
        </div>
      ) : null}
      {kind === "table" ? (
        <div className="space-y-2">
          <GroupError message={error(".points")} />
          {points.fields.map((field, i) => (
            <div key={field.id} className="grid items-end gap-3 sm:grid-cols-[1fr_1fr_auto]">
              <TextField label={`Point ${i + 1}: temperature, K`} inputMode="decimal" error={error(`.points.${i}.0`)} {...register(`${path}.points.${i}.temperature_K`)} />
              <TextField label={`Point ${i + 1}: emissivity`} inputMode="decimal" error={error(`.points.${i}.1`)} {...register(`${path}.points.${i}.emissivity`)} />
              <Button variant="ghost" size="sm" disabled={points.fields.length <= 1} onClick={() => points.remove(i)} aria-label={`Remove point ${i + 1} of ${label}`}>
                Remove
              </Button>
            </div>
          ))}
          <Button variant="secondary" size="sm" onClick={() => points.append({ temperature_K: "", emissivity: "" })}>
            Add a point
          </Button>
          <p className="text-sm text-ink-300">Temperatures strictly increasing; between points the value is linear in T, beyond the ends it is held.</p>
        </div>
      ) : null}
      {kind !== "constant" ? <GroupError message={whole} /> : null}
    </fieldset>
  );
}
