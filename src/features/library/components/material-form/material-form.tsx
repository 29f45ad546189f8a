import { useState } from "react";
import { FormProvider, useForm, useWatch, type FieldErrors, type Path } from "react-hook-form";
import { MATERIAL_KINDS, type MaterialVersionInput, type MaterialVersionInputSchema, type ProposeVersionInputSchema } from "../../../../../shared/schemas/material";
import { Button } from "../../../../components/ui/button";
import { Callout } from "../../../../components/ui/callout";
import { SelectField, TextAreaField, TextField } from "../../../../components/ui/field";
import { isApiError } from "../../../../lib/api-client";
import { applyServerErrors } from "../../../../lib/form-errors";
import { KIND_LABELS } from "../../utils/library-text";
import { GroupError } from "./emissivity-model-fields";
import type { MaterialFormValues } from "./form-values";
import { KindFields } from "./kind-fields";
import { materialResolver } from "./material-resolver";
import { SourceFields } from "./source-fields";

type Props = {
  label: string;
  defaultValues: MaterialFormValues;
  schema: typeof MaterialVersionInputSchema | typeof ProposeVersionInputSchema;
  /** A proposed change keeps the entry's kind: the server refuses a new one. */
  kindLocked?: boolean;
  changeNoteRequired?: boolean;
  submitLabel: string;
  onSubmit: (input: MaterialVersionInput) => Promise<unknown>;
};

/** Every message in a nested error object, for the summary above a long form. */
function messagesOf(errors: FieldErrors): string[] {
  const out: string[] = [];
  const walk = (node: unknown) => {
    if (!node || typeof node !== "object") return;
    const { message, ref: _ref, ...rest } = node as { message?: unknown; ref?: unknown };
    if (typeof message === "string") out.push(message);
    Object.values(rest).forEach(walk);
  };
  walk(errors);
  return [...new Set(out)];
}

// The server names fields with the contract's dotted paths, which the form's paths mirror.
const serverPaths = (error: unknown) => (isApiError(error) ? error.fields.map((f) => f.path as Path<MaterialFormValues>) : []);

/** One form for a new entry and for a proposed change: kind-specific properties, range, source. */
export function MaterialForm({ label, defaultValues, schema, kindLocked = false, changeNoteRequired = false, submitLabel, onSubmit }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<MaterialFormValues, unknown, MaterialVersionInput>({ resolver: materialResolver(schema), defaultValues });
  const { register, handleSubmit, setError, setValue, control, formState } = form;
  const kind = useWatch({ control, name: "properties.kind" });
  const errors = messagesOf(formState.errors);

  const submit = handleSubmit(async (input) => {
    setFormError(null);
    try {
      await onSubmit(input);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, serverPaths(error), { name_taken: "name" }));
    }
  });

  const kindField = register("properties.kind", {
    onChange: (event: React.ChangeEvent<HTMLSelectElement>) => setValue("properties.form", event.target.value === "spacer" ? "netting" : "film"),
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate className="space-y-6" aria-label={label}>
        {formError ? <Callout tone="error" title="Not saved">{formError}</Callout> : null}
        {formState.submitCount > 0 && errors.length > 0 ? (
          <Callout tone="error" title={`Check ${errors.length === 1 ? "one field" : `${errors.length} fields`}; nothing was saved`}>
            <ul className="list-disc pl-4">{errors.map((m) => <li key={m}>{m}</li>)}</ul>
          </Callout>
        ) : null}
        <div className="grid gap-4 sm:grid-cols-[2fr_1fr]">
          <TextField label="Name" hint="A generic name, 2 to 120 characters; no brand names." error={formState.errors.name?.message} {...register("name")} />
          {kindLocked ? (
            <div className="space-y-1.5 text-sm">
              <p className="font-medium text-ink-100">Kind</p>
              <p className="py-2 text-ink-50">{KIND_LABELS[kind]}</p>
              <p className="text-ink-300">An entry's kind cannot change.</p>
            </div>
          ) : (
            <SelectField label="Kind" {...kindField}>
              {MATERIAL_KINDS.map((k) => (
                <option key={k} value={k}>{KIND_LABELS[k]}</option>
              ))}
            </SelectField>
          )}
        </div>
        <section className="space-y-3" aria-label="Properties">
          <h2 className="text-sm font-semibold text-ink-50">Properties of the {KIND_LABELS[kind].toLowerCase()}</h2>
          <KindFields kind={kind} />
        </section>
        <fieldset className="space-y-3">
          <legend className="text-sm font-semibold text-ink-50">Valid range and physical data (SI)</legend>
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
            <TextField label="Valid from, K" inputMode="decimal" error={formState.errors.validRange_K?.min?.message} {...register("validRange_K.min")} />
            <TextField label="Valid to, K" inputMode="decimal" error={formState.errors.validRange_K?.max?.message} {...register("validRange_K.max")} />
            <TextField label="Thickness, m (optional)" inputMode="decimal" error={formState.errors.thickness_m?.message} {...register("thickness_m")} />
            <TextField label="Areal mass, kg/m² (optional)" inputMode="decimal" error={formState.errors.arealMass_kg_per_m2?.message} {...register("arealMass_kg_per_m2")} />
            <TextField label="Cost per m² (optional)" inputMode="decimal" error={formState.errors.cost_per_m2?.message} {...register("cost_per_m2")} />
          </div>
          <GroupError message={formState.errors.validRange_K?.message} />
        </fieldset>
        <SourceFields />
        <TextAreaField
          label={changeNoteRequired ? "What changed" : "Change note (optional)"}
          hint={changeNoteRequired ? "Required: the owner reads this when deciding. Up to 500 characters." : "Up to 500 characters."}
          error={formState.errors.changeNote?.message}
          {...register("changeNote")}
        />
        <Button type="submit" busy={formState.isSubmitting}>
          {submitLabel}
        </Button>
      </form>
    </FormProvider>
  );
}
