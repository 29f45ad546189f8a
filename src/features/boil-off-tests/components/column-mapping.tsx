import { PRESSURE_UNIT_IDS, TIME_FORMATS, VALUE_UNITS, type LogPreview, type TestMethod } from "../../../../shared/schemas/boil-off-test";
import { SelectField } from "../../../components/ui/field";
import { unitsForMethod } from "../utils/method-text";

/** The mapping as the selects hold it: strings, "" for an optional column left out. */
export type Mapping = {
  timeColumn: string;
  timeFormat: string;
  valueColumn: string;
  valueUnit: string;
  pressureColumn: string;
  pressureUnit: string;
};

export function mappingFrom(preview: LogPreview, method: TestMethod): Mapping {
  const d = preview.detected;
  return {
    timeColumn: d.timeColumn ?? "",
    timeFormat: d.timeFormat ?? "iso",
    valueColumn: d.valueColumn ?? "",
    valueUnit: d.valueUnit ?? unitsForMethod(method)[0],
    pressureColumn: d.pressureColumn ?? "",
    pressureUnit: d.pressureUnit ?? "",
  };
}

const TIME_FORMAT_LABELS = { iso: "ISO 8601 date and time", seconds: "Seconds from the start" } as const;

/** Which column is time, which the reading and which (optionally) the barometer, and their units. */
export function ColumnMapping({ header, method, mapping, errors, onChange }: {
  header: string[];
  method: TestMethod;
  mapping: Mapping;
  errors: Partial<Record<keyof Mapping, string>>;
  onChange: (next: Mapping) => void;
}) {
  // Leaving the barometer out clears its unit too (a unit without a column is refused).
  const set = (key: keyof Mapping) => (e: { target: { value: string } }) =>
    onChange({ ...mapping, [key]: e.target.value, ...(key === "pressureColumn" && !e.target.value ? { pressureUnit: "" } : {}) });
  const columns = header.map((name, i) => <option key={`${i}-${name}`} value={name}>{name}</option>);
  return (
    <fieldset className="grid gap-4 sm:grid-cols-2">
      <legend className="mb-2 text-sm font-medium text-ink-100">Column mapping</legend>
      <SelectField label="Time column" value={mapping.timeColumn} onChange={set("timeColumn")} error={errors.timeColumn}>
        <option value="">Pick a column</option>
        {columns}
      </SelectField>
      <SelectField label="Time format" value={mapping.timeFormat} onChange={set("timeFormat")} error={errors.timeFormat} hint="A time without a zone is read as UTC.">
        {TIME_FORMATS.map((f) => <option key={f} value={f}>{TIME_FORMAT_LABELS[f]}</option>)}
      </SelectField>
      <SelectField label="Reading column" value={mapping.valueColumn} onChange={set("valueColumn")} error={errors.valueColumn}>
        <option value="">Pick a column</option>
        {columns}
      </SelectField>
      <SelectField label="Reading unit" value={mapping.valueUnit} onChange={set("valueUnit")} error={errors.valueUnit}>
        {unitsForMethod(method).map((u) => <option key={u} value={u}>{VALUE_UNITS[u].label}</option>)}
      </SelectField>
      <SelectField label="Barometer column (optional)" value={mapping.pressureColumn} onChange={set("pressureColumn")} error={errors.pressureColumn}>
        <option value="">None</option>
        {columns}
      </SelectField>
      <SelectField label="Barometer unit" value={mapping.pressureUnit} onChange={set("pressureUnit")} error={errors.pressureUnit} disabled={!mapping.pressureColumn}>
        <option value="">{mapping.pressureColumn ? "Read from the column" : "No barometer column"}</option>
        {PRESSURE_UNIT_IDS.map((u) => <option key={u} value={u}>{u}</option>)}
      </SelectField>
    </fieldset>
  );
}
