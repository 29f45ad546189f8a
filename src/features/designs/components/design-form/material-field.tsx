import { useController, useFormContext, type FieldPath } from "react-hook-form";
import type { DesignContentInput, MaterialRef } from "../../../../../shared/schemas/design";
import type { MaterialKind, MaterialSummary } from "../../../../../shared/schemas/material";
import { SelectField } from "../../../../components/ui/field";
import { refOf } from "../../lib/default-content";
import { useLibrary } from "./library-context";

type MaterialFieldProps = {
  name: FieldPath<DesignContentInput>;
  label: string;
  kind: MaterialKind;
  /** When given, the pick may be left empty (stored as null) and this is the empty option's words. */
  noneLabel?: string;
  hint?: string;
  onPicked?: (entry: MaterialSummary | null) => void;
};

const keyOf = (ref: unknown) => {
  if (ref === null || typeof ref !== "object" || !("materialId" in ref)) return "";
  const r = ref as MaterialRef;
  return `${r.materialId}@${r.version}`;
};

/** A library pick: stores { materialId, version: currentVersion }, the exact version used. */
export function MaterialField({ name, label, kind, noneLabel, hint, onPicked }: MaterialFieldProps) {
  const { control } = useFormContext<DesignContentInput>();
  // Taken apart: the compiler treats an object holding a ref as a ref, and would refuse the rest.
  const { field: { ref, value: fieldValue, onChange, onBlur, name: fieldName }, fieldState } = useController({ control, name });
  const { picks, known } = useLibrary();
  const options = picks[kind];
  const value = keyOf(fieldValue);
  const offered = options.some((m) => `${m.id}@${m.currentVersion}` === value);
  // A revision may hold an older or retired version: keep showing it, named, until changed.
  const kept = value && !offered ? known.find((m) => `${m.materialId}@${m.version}` === value) : undefined;

  return (
    <SelectField
      label={label}
      name={fieldName}
      ref={ref}
      value={value}
      onBlur={onBlur}
      hint={hint}
      error={fieldState.error?.message}
      onChange={(event) => {
        const entry = options.find((m) => `${m.id}@${m.currentVersion}` === event.target.value) ?? null;
        onChange(entry ? refOf(entry) : noneLabel ? null : undefined);
        onPicked?.(entry);
      }}
    >
      {noneLabel ? <option value="">{noneLabel}</option> : value === "" ? <option value="">Pick a library entry</option> : null}
      {value && !offered ? <option value={value}>{kept ? `${kept.name} (version ${kept.version}, as saved)` : `Version as saved (${value})`}</option> : null}
      {options.map((m) => (
        <option key={m.id} value={`${m.id}@${m.currentVersion}`}>
          {m.name}
        </option>
      ))}
    </SelectField>
  );
}
