import { useFormContext, useWatch } from "react-hook-form";
import { SelectField, TextAreaField, TextField } from "../../../../components/ui/field";
import type { MaterialFormValues } from "./form-values";
import { useErrorOf } from "./use-error-of";

/** Where the numbers come from: a publication, an in-house test, or memory (said plainly). */
export function SourceFields() {
  const { register, control } = useFormContext<MaterialFormValues>();
  const errorOf = useErrorOf();
  const type = useWatch({ control, name: "source.type" });
  const at = (name: string) => errorOf(`source.${name}`);
  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-semibold text-ink-50">Source</legend>
      <SelectField label="Source type" error={at("type")} {...register("source.type")}>
        <option value="citation">A publication (citation)</option>
        <option value="measured">Measured in-house</option>
        <option value="memory">From memory</option>
      </SelectField>
      {type === "citation" ? (
        <>
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField label="Author(s)" error={at("author")} {...register("source.author")} />
            <TextField label="Title" error={at("title")} {...register("source.title")} />
            <TextField label="Year (optional)" inputMode="numeric" error={at("year")} {...register("source.year")} />
            <TextField label="Table, page or section (optional)" error={at("location")} {...register("source.location")} />
          </div>
          <label className="flex items-center gap-2 text-sm text-ink-100">
            <input type="checkbox" className="accent-frost-400" {...register("source.fromMemory")} />
            Recalled as from this work, not read off it
          </label>
        </>
      ) : null}
      {type === "measured" ? <TextField label="Which in-house test" error={at("test")} {...register("source.test")} /> : null}
      <TextAreaField label="Note (optional)" error={at("note")} {...register("source.note")} />
    </fieldset>
  );
}
