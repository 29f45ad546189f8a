import { useState } from "react";
import { useController, type Control, type FieldPath, type FieldValues } from "react-hook-form";
import { unitLabel, type QuantityKind, type UnitSystem } from "../../shared/units";
import { inputText, localizeRange, parseInput } from "../lib/format-quantity";
import { useUnitSystem } from "../lib/unit-system";
import { TextField } from "./ui/field";

export interface QuantityInputProps<T extends FieldValues> {
  control: Control<T>;
  name: FieldPath<T>;
  label: string;
  /** The quantity, for unit conversion; null for pure numbers (counts, fractions, factors). */
  kind: QuantityKind | null;
  /** The unit words of a pure number, e.g. "layers". */
  suffix?: string;
  hint?: string;
  id?: string;
  /** What an emptied input means: undefined (left out, or a required number) or null (cleared). */
  empty?: null;
  disabled?: boolean;
}

/**
 * A number typed in the user's unit system while the form keeps SI. The typed text stays on
 * screen as typed (a half-written "0." or a wrong "abc", so the schema's message can point at
 * it); it is re-derived from the form's value only when that value changes from elsewhere (a
 * reset, a unit switch).
 */
export function QuantityInput<T extends FieldValues>({ control, name, label, kind, suffix, hint, id, empty, disabled }: QuantityInputProps<T>) {
  // Taken apart: the compiler treats an object holding a ref as a ref, and would refuse the rest.
  const { field: { ref, value: fieldValue, onChange, onBlur, name: fieldName }, fieldState } = useController({ control, name });
  const system = useUnitSystem();
  const [draft, setDraft] = useState<{ text: string; value: unknown; system: UnitSystem } | null>(null);
  const text = draft && Object.is(draft.value, fieldValue) && draft.system === system ? draft.text : inputText(kind, fieldValue, system);
  const unit = kind ? unitLabel(kind, system) : suffix;
  const error = fieldState.error?.message;
  return (
    <TextField
      id={id}
      label={unit ? `${label} (${unit})` : label}
      inputMode="decimal"
      autoComplete="off"
      name={fieldName}
      ref={ref}
      value={text}
      disabled={disabled}
      onBlur={onBlur}
      onChange={(event) => {
        const value = parseInput(kind, event.target.value, system, empty);
        setDraft({ text: event.target.value, value, system });
        onChange(value);
      }}
      hint={hint}
      error={error ? localizeRange(error, kind, system) : undefined}
    />
  );
}
