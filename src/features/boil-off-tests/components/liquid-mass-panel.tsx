import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { PatchTestInputSchema, TARE_MASS_RANGE_KG, type PatchTestInput, type TestDetail } from "../../../../shared/schemas/boil-off-test";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { Card } from "../../../components/ui/card";
import { isApiError } from "../../../lib/api-client";
import { applyServerErrors } from "../../../lib/form-errors";
import { formatNumber, formatQuantity } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { useUpdateLiquidMass, type LiquidMassPatch } from "../api/update-liquid-mass";
import { LIQUID_MASS_FIGURES, LIQUID_MASS_TITLE, liquidMassFieldId, needsLiquidMassFigure, type LiquidMassMethod } from "../utils/liquid-mass";
import { QuantityInput } from "../../../components/quantity-input";

const WHY: Record<LiquidMassMethod, string> = {
  weighing: "The scale weighs the vessel with its liquid, so the liquid is the reading less the empty vessel's mass (its tare).",
  "vent-flow": "The liquid is the starting fill of the capacity, less what has boiled off up to the window's middle.",
};

/**
 * The liquid-mass figure of a weighing or vent-flow test, set or cleared after creation. With a
 * barometer column in the log the barometric correction needs it; saving re-runs the analysis.
 * Nothing typed is lost on a refusal: field issues sit under the field, a 409 (accepted
 * meanwhile) above the form, which stays as typed until the page is left.
 */
export function LiquidMassPanel({ test, canEdit, variant }: { test: TestDetail; canEdit: boolean; variant: "card" | "section" }) {
  const headingId = useId();
  if (!needsLiquidMassFigure(test.method)) return null;
  const body = (
    <>
      <p className="mb-4 text-sm text-ink-300">
        With a barometer column in the log, the barometric correction needs the liquid mass in the vessel. {WHY[test.method]}
        {test.method === "vent-flow" && test.capacity_L === null ? " This test has no capacity, so the fill fraction alone cannot give it." : ""}
      </p>
      {canEdit ? <LiquidMassForm test={test} method={test.method} /> : <StoredFigure test={test} method={test.method} />}
    </>
  );
  // In the comparison, right under the correction's reason; on its own before there is an analysis.
  if (variant === "card") return <Card title={LIQUID_MASS_TITLE}>{body}</Card>;
  return (
    <section aria-labelledby={headingId} className="rounded-md border border-ink-700 p-4">
      <h3 id={headingId} className="mb-2 text-sm font-semibold text-ink-50">{LIQUID_MASS_TITLE}</h3>
      {body}
    </section>
  );
}

function StoredFigure({ test, method }: { test: TestDetail; method: LiquidMassMethod }) {
  const system = useUnitSystem();
  const { label } = LIQUID_MASS_FIGURES[method];
  const value = method === "weighing" ? test.tareMass_kg : test.fillFraction;
  const shown = value === null ? "Not set" : method === "weighing" ? formatQuantity("mass", value, system, 5) : formatNumber(value, 5);
  return (
    <dl aria-label={LIQUID_MASS_TITLE} className="grid grid-cols-[max-content_1fr] gap-x-4 text-sm">
      <dt className="text-ink-300">{label}</dt>
      <dd className="font-mono text-ink-50">{shown}</dd>
    </dl>
  );
}

function LiquidMassForm({ test, method }: { test: TestDetail; method: LiquidMassMethod }) {
  const system = useUnitSystem();
  const { name, label } = LIQUID_MASS_FIGURES[method];
  const stored = method === "weighing" ? test.tareMass_kg : test.fillFraction;
  const save = useUpdateLiquidMass();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<PatchTestInput>({ resolver: zodResolver(PatchTestInputSchema), defaultValues: { [name]: stored } });
  const value = useWatch({ control: form.control, name });
  const conflict = isApiError(save.error) && save.error.status === 409 ? save.error : null;
  const frozen = test.status === "accepted";

  const submit = form.handleSubmit(async (values) => {
    setProblem(null);
    const next = values[name] ?? null;
    const patch: LiquidMassPatch = name === "tareMass_kg" ? { tareMass_kg: next } : { fillFraction: next };
    try {
      const saved = await save.mutateAsync({ testId: test.id, patch });
      form.reset({ [name]: name === "tareMass_kg" ? saved.tareMass_kg : saved.fillFraction });
    } catch (error) {
      // A 409 is shown from the mutation's own state, above the form.
      if (!isApiError(error) || error.status !== 409) setProblem(applyServerErrors(error, form.setError, [name]));
    }
  });

  // An accepted test keeps its figures; the form stays only to show a refusal with what was typed.
  if (frozen && !conflict) {
    return (
      <div className="space-y-2">
        <StoredFigure test={test} method={method} />
        <p className="text-sm text-ink-300">The test is accepted, so its figures are frozen.</p>
      </div>
    );
  }
  const unchanged = Object.is(value ?? null, stored);
  return (
    <form noValidate onSubmit={submit} aria-label={LIQUID_MASS_TITLE} className="space-y-4">
      {conflict ? (
        <Callout tone="error" title={`The ${label.toLowerCase()} was not saved`}>
          {conflict.message}
          {frozen ? " The page now shows the test as accepted; what you typed is kept below." : " The page now shows the test as it is; send the change again."}
        </Callout>
      ) : null}
      {problem ? <Callout tone="error" title={`The ${label.toLowerCase()} was not saved`}>{problem}</Callout> : null}
      <div className="max-w-sm">
        <QuantityInput
          control={form.control}
          name={name}
          id={liquidMassFieldId(test.id)}
          label={label}
          kind={method === "weighing" ? "mass" : null}
          empty={null}
          hint={
            method === "weighing"
              ? `From 0 to ${formatQuantity("mass", TARE_MASS_RANGE_KG.max, system)}. Leave empty and save to clear it.`
              : "Of the capacity at the first reading: above 0, at most 1. Leave empty and save to clear it."
          }
        />
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="secondary" busy={save.isPending} disabled={unchanged || frozen}>
          {test.log ? "Save and re-run the analysis" : `Save the ${label.toLowerCase()}`}
        </Button>
        {stored !== null && !frozen ? (
          <Button
            variant="ghost"
            disabled={save.isPending}
            onClick={() => {
              form.setValue(name, null);
              void submit();
            }}
          >
            Clear the {label.toLowerCase()}
          </Button>
        ) : null}
        {save.isSuccess && unchanged ? <span role="status" className="text-sm text-moss-300">{test.log ? "Saved; the analysis was re-run." : "Saved."}</span> : null}
      </div>
    </form>
  );
}
