import { useController, useFieldArray, useFormContext, useWatch, type FieldPath } from "react-hook-form";
import type { DesignContentInput } from "../../../../../shared/schemas/design";
import { Button } from "../../../../components/ui/button";
import { SelectField, TextField } from "../../../../components/ui/field";
import { refOf } from "../../lib/default-content";
import { FormSection } from "./form-section";
import { ItemToolbar } from "./item-toolbar";
import { useLibrary } from "./library-context";
import { MaterialField } from "./material-field";
import { QuantityField } from "./quantity-field";

type End = "warm" | "cold" | number;

/** From/to of a support: the warm wall, a stage (by its index among stages), or the cold vessel. */
function EndSelect({ name, label, ends }: { name: FieldPath<DesignContentInput>; label: string; ends: { value: End; words: string }[] }) {
  const { control } = useFormContext<DesignContentInput>();
  // Taken apart: the compiler treats an object holding a ref as a ref, and would refuse the rest.
  const { field: { ref, value: fieldValue, onChange, onBlur, name: fieldName }, fieldState } = useController({ control, name });
  return (
    <SelectField
      label={label}
      name={fieldName}
      ref={ref}
      value={String(fieldValue)}
      onBlur={onBlur}
      error={fieldState.error?.message}
      onChange={(event) => onChange(/^\d+$/.test(event.target.value) ? Number(event.target.value) : event.target.value)}
    >
      {ends.map((end) => (
        <option key={String(end.value)} value={String(end.value)}>
          {end.words}
        </option>
      ))}
    </SelectField>
  );
}

export function SupportsEditor() {
  const { control, register, formState } = useFormContext<DesignContentInput>();
  const { picks } = useLibrary();
  const { fields, append, remove, move } = useFieldArray({ control, name: "supports" });
  const layup = useWatch({ control, name: "layup" });
  const stages = layup.filter((i) => i.kind === "stage").map((s, i) => ({ value: i as End, words: `Stage ${i + 1}${s.kind === "stage" && s.label ? ` (${s.label})` : ""}` }));
  const from = [{ value: "warm" as End, words: "Warm wall" }, ...stages];
  const to = [...stages, { value: "cold" as End, words: "Cold vessel" }];
  const material = picks["support-material"][0];

  return (
    <FormSection title="Supports and penetrations" description="Straps, rods, tubes and necks that bridge the vacuum space; each conducts (A/L)·∫k dT, times its count.">
      {fields.length === 0 ? <p className="text-sm text-ink-300">No supports yet: the blanket alone carries the heat.</p> : null}
      <ol className="space-y-4">
        {fields.map((item, index) => (
          <li key={item.id}>
            <fieldset className="space-y-3 rounded-md border border-ink-700 bg-ink-950/40 p-4">
              <legend className="float-left pt-1 text-sm font-semibold text-ink-50">Support {index + 1}</legend>
              <div className="float-right">
                <ItemToolbar name={`support ${index + 1}`} index={index} count={fields.length} onMove={move} onRemove={remove} />
              </div>
              <div className="clear-both grid gap-4 pt-1 sm:grid-cols-2">
                <TextField label="Support label (optional)" error={formState.errors.supports?.[index]?.label?.message} {...register(`supports.${index}.label`, { setValueAs: (v: string) => (v.trim() === "" ? undefined : v) })} />
                <MaterialField name={`supports.${index}.material`} label="Support material" kind="support-material" />
                <QuantityField name={`supports.${index}.area_m2`} label="Cross-section area" kind="area" />
                <QuantityField name={`supports.${index}.length_m`} label="Support length" kind="length" />
                <QuantityField name={`supports.${index}.count`} label="Count" kind={null} suffix="alike" />
                <EndSelect name={`supports.${index}.from`} label="From" ends={from} />
                <EndSelect name={`supports.${index}.to`} label="To" ends={to} />
              </div>
            </fieldset>
          </li>
        ))}
      </ol>
      <Button
        variant="secondary"
        size="sm"
        disabled={!material}
        onClick={() => append({ material: refOf(material), area_m2: 1e-4, length_m: 0.3, count: 1, from: "warm", to: "cold" })}
      >
        + Add support
      </Button>
    </FormSection>
  );
}
