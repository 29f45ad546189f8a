import { useState } from "react";
import { fromSi, type UnitSystem } from "../../../../shared/units";
import { TextField } from "../../../components/ui/field";

// The API takes a price per litre; a US-customary user types a price per gallon.
const litresPerUnit = (system: UnitSystem) => 1 / fromSi("volume", 1, system);

type PriceFieldProps = { pricePerL: number | null; system: UnitSystem; onChange: (pricePerL: number | null) => void };

/** The cryogen price for the yearly cost; the typed text stays as typed, only a valid price is sent. */
export function PriceField({ pricePerL, system, onChange }: PriceFieldProps) {
  const shown = pricePerL === null ? "" : String(Number((pricePerL * litresPerUnit(system)).toPrecision(6)));
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  const unit = system === "si" ? "litre" : "gallon";
  const max = 1000 * litresPerUnit(system);

  return (
    <TextField
      label={`Price per ${unit} of cryogen (your currency)`}
      inputMode="decimal"
      value={text}
      hint="Gives each design's yearly cryogen cost. Leave empty for none."
      error={error ?? undefined}
      onChange={(e) => {
        setText(e.target.value);
        const t = e.target.value.trim();
        if (t === "") return (setError(null), onChange(null));
        const v = Number(t.replace(",", "."));
        if (!Number.isFinite(v) || v < 0 || v > max) return setError(`price per ${unit} must be a number from 0 to ${Number(max.toPrecision(4))}`);
        setError(null);
        onChange(v / litresPerUnit(system));
      }}
    />
  );
}
