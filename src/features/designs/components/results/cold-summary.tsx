import type { Prediction } from "../../../../../shared/design/prediction";
import { formatNumber, formatQuantity } from "../../../../lib/format-quantity";
import { useUnitSystem } from "../../../../lib/unit-system";

function holdTime(h: number | null) {
  if (h === null) return "— (needs a cryogen and a capacity)";
  if (!Number.isFinite(h)) return "no boil-off";
  return h >= 48 ? `${formatNumber(h)} h (${formatNumber(h / 24)} days)` : `${formatNumber(h)} h`;
}

/** The figures people quote for the cold vessel; the heat is the one the sweep and the list show. */
export function ColdSummary({ prediction }: { prediction: Prediction }) {
  const system = useUnitSystem();
  const { result } = prediction;
  const cold = result.stages[result.stages.length - 1];
  const band = result.band?.at(-1);
  const items: [string, string][] = [
    ["Heat flux (blanket)", formatQuantity("heatFlux", result.heatFlux_W_per_m2, system)],
    ["Boil-off", prediction.coldBoilOff_L_per_day === null ? "— (no cryogen)" : formatQuantity("volumePerDay", prediction.coldBoilOff_L_per_day, system)],
    ["Boil-off (mass)", cold.boilOff ? formatQuantity("massPerDay", cold.boilOff.evaporatedMass_kg_per_h * 24, system) : "—"],
    ["Normal evaporation rate", prediction.evaporationRate_percent_per_day === null ? "— (needs a capacity)" : formatQuantity("percentPerDay", prediction.evaporationRate_percent_per_day, system)],
    ["Hold time", holdTime(prediction.holdTime_h)],
    ["Band (low – high emissivity)", band ? `${formatQuantity("heat", band.low_W, system)} – ${formatQuantity("heat", band.high_W, system)}` : "— (the reflectors carry no band)"],
  ];
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-300">Heat into the cold vessel</p>
      <output aria-label="Heat into the cold vessel" className="block font-mono text-3xl font-semibold text-frost-200">
        {formatQuantity("heat", prediction.coldHeat_W, system)}
      </output>
      <dl className="grid gap-x-4 gap-y-2 text-sm sm:grid-cols-2">
        {items.map(([term, value]) => (
          <div key={term}>
            <dt className="text-ink-300">{term}</dt>
            <dd className="font-mono text-ink-50">{value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
