import { useState } from "react";
import { useController, type Control, type FieldPath, type FieldValues } from "react-hook-form";
import { unitLabel, type QuantityKind, type UnitSystem } from "../../../../shared/units";
import { TextField } from "../../../components/ui/field";
import { inputText, localizeRange, parseInput } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";

/**
 * An optional number typed in the user's unit system while the form keeps SI. What was typed
 * stays on screen as typed (a wrong "abc" too, so the schema's message can point at it). An
 * empty field is `empty`: undefined (left out) in a new test, null (cleared) in a change.
 */
export function QuantityInput<T extends FieldValues>({ control, name, label, kind, suffix, hint, id, empty }: {
  control: Control<T>;
  name: FieldPath<T>;
  label: string;
  kind: QuantityKind | null;
  suffix?: string;
  hint?: string;
  id?: string;
  empty?: null;
}) {
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
