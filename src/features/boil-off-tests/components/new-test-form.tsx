import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { CreateTestInputSchema, TARE_MASS_RANGE_KG, TEST_METHODS, VENT_REFERENCES, type CreateTestInput, type TestDetail } from "../../../../shared/schemas/boil-off-test";
import { VENT_REFERENCE_CONDITIONS } from "../../../../shared/thermal/boil-off";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { SelectField, TextAreaField, TextField } from "../../../components/ui/field";
import { applyServerErrors } from "../../../lib/form-errors";
import { formatQuantity } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { useCreateTest } from "../api/create-test";
import { useDesignChoices, useDesignRevisions, useRevisionStages } from "../api/get-design-choices";
import { METHOD_HINTS, METHOD_LABELS } from "../utils/method-text";
import { QuantityInput } from "../../../components/quantity-input";

const FIELDS = ["designId", "revision", "stageIndex", "method", "vesselLabel", "ventReference", "ambientTemperature_K", "ambientPressure_Pa", "notes", "capacity_L", "fullScale_mm", "tareMass_kg", "fillFraction"] as const;

/** A new test: which revision's prediction it checks, how it is measured, and on what vessel. */
export function NewTestForm({ onCreated }: { onCreated: (test: TestDetail) => unknown }) {
  const create = useCreateTest();
  const system = useUnitSystem();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<CreateTestInput>({
    resolver: zodResolver(CreateTestInputSchema),
    defaultValues: { designId: "", method: "weighing", vesselLabel: "", notes: "" },
  });
  const { register, control, setValue, setError, formState: { errors, isSubmitting } } = form;
  const [designId, revision, stageIndex, method] = useWatch({ control, name: ["designId", "revision", "stageIndex", "method"] });
  const designs = useDesignChoices();
  const design = useDesignRevisions(designId || null);
  const stages = useRevisionStages(designId || null, Number.isFinite(revision) ? revision : null);
  const measurable = (stages.data ?? []).filter((s) => s.hasCryogen);
  // The cold vessel (the last stage with a cryogen) unless someone picks another.
  const shownStage = stageIndex ?? measurable.at(-1)?.index;

  const onSubmit = form.handleSubmit(async (values) => {
    setProblem(null);
    try {
      onCreated(
        await create.mutateAsync({
          ...values,
          stageIndex: values.stageIndex ?? shownStage,
          ventReference: values.method === "vent-flow" ? values.ventReference : undefined,
          // Each belongs to one method; a value typed before switching method is dropped.
          tareMass_kg: values.method === "weighing" ? values.tareMass_kg : undefined,
          fillFraction: values.method === "vent-flow" ? values.fillFraction : undefined,
        }),
      );
    } catch (error) {
      setProblem(applyServerErrors(error, setError, FIELDS));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="New boil-off test" className="space-y-5">
      {problem ? <Callout tone="error" title="The test was not created">{problem}</Callout> : null}
      <div className="grid gap-4 sm:grid-cols-3">
        <SelectField
          label="Design"
          error={errors.designId?.message}
          {...register("designId", {
            onChange: (e: { target: { value: string } }) => {
              const picked = designs.data?.designs.find((d) => d.id === e.target.value);
              setValue("revision", picked?.latestRevision ?? Number.NaN);
              setValue("stageIndex", undefined);
            },
          })}
        >
          <option value="">{designs.isPending ? "Loading designs…" : "Pick a design"}</option>
          {designs.data?.designs.map((d) => (
            <option key={d.id} value={d.id}>{d.name}</option>
          ))}
        </SelectField>
        <SelectField label="Revision" error={errors.revision?.message} disabled={!designId} {...register("revision", { valueAsNumber: true, onChange: () => setValue("stageIndex", undefined) })}>
          {!design.data ? <option value="">{designId ? "Loading…" : "Pick a design first"}</option> : null}
          {design.data?.revisions.map((r) => (
            <option key={r.revision} value={r.revision}>
              {r.revision}{r.revision === design.data.latestRevision ? " (latest)" : ""}{r.changeNote ? ` · ${r.changeNote}` : ""}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Stage measured"
          hint="The stage whose cryogen boils off into the logger."
          error={errors.stageIndex?.message}
          disabled={measurable.length === 0}
          value={shownStage ?? ""}
          onChange={(e) => setValue("stageIndex", e.target.value === "" ? undefined : Number(e.target.value))}
        >
          {measurable.length === 0 ? <option value="">{stages.isFetching ? "Loading…" : "No stage with a cryogen"}</option> : null}
          {measurable.map((s) => (
            <option key={s.index} value={s.index}>{s.label}</option>
          ))}
        </SelectField>
      </div>

      <fieldset className="space-y-2">
        <legend className="text-sm font-medium text-ink-100">Method</legend>
        <div className="grid gap-2 sm:grid-cols-3">
          {TEST_METHODS.map((m) => (
            <label key={m} className="flex gap-2 rounded-md border border-ink-700 p-3 text-sm has-[:checked]:border-frost-400">
              <input type="radio" value={m} className="mt-1 accent-frost-400" {...register("method")} />
              <span>
                <span className="block font-medium text-ink-50">{METHOD_LABELS[m]}</span>
                <span className="text-ink-300">{METHOD_HINTS[m]}</span>
              </span>
            </label>
          ))}
        </div>
        {errors.method ? <p className="text-sm text-fault-300">{errors.method.message}</p> : null}
      </fieldset>

      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Vessel label or serial" error={errors.vesselLabel?.message} {...register("vesselLabel")} />
        {method === "vent-flow" ? (
          <SelectField label="Flowmeter reference conditions" hint="The state the flowmeter's standard litres refer to." error={errors.ventReference?.message} {...register("ventReference")}>
            {VENT_REFERENCES.map((r) => (
              <option key={r} value={r}>{VENT_REFERENCE_CONDITIONS[r].label}</option>
            ))}
          </SelectField>
        ) : null}
        <QuantityInput control={control} name="ambientTemperature_K" label="Ambient temperature (optional)" kind="temperature" />
        <QuantityInput control={control} name="ambientPressure_Pa" label="Ambient pressure (optional)" kind="pressure" hint="Used for the barometric note when the log has no pressure column." />
        <QuantityInput
          control={control}
          name="capacity_L"
          label={method === "level" ? "Capacity" : "Capacity (optional)"}
          kind="volume"
          hint={method === "level" ? "Turns the level into litres; left empty, the design's capacity for the stage is used." : "For the evaporation rate; left empty, the design's capacity is used."}
        />
        {method === "level" ? <QuantityInput control={control} name="fullScale_mm" label="Gauge full scale (for a log in mm)" kind={null} suffix="mm" /> : null}
        {method === "weighing" ? (
          <QuantityInput
            control={control}
            name="tareMass_kg"
            label="Empty vessel mass (optional)"
            kind="mass"
            hint={`Tare, up to ${formatQuantity("mass", TARE_MASS_RANGE_KG.max, system)}. Gives the liquid mass for the barometric correction.`}
          />
        ) : null}
        {method === "vent-flow" ? (
          <QuantityInput
            control={control}
            name="fillFraction"
            label="Starting fill fraction (optional)"
            kind={null}
            hint="Above 0, at most 1, at the first reading. Gives the liquid mass for the barometric correction."
          />
        ) : null}
      </div>
      <TextAreaField label="Notes (optional)" error={errors.notes?.message} {...register("notes")} />
      <Button type="submit" busy={isSubmitting}>Create test</Button>
    </form>
  );
}
