import { memo } from "react";
import type { AssemblyResult } from "../../../../../shared/thermal/assembly";
import { formatQuantity } from "../../../../lib/format-quantity";
import { useUnitSystem } from "../../../../lib/unit-system";

type Stage = AssemblyResult["stages"][number];
type Row = { label: string; value: (s: Stage, i: number) => string; strong?: boolean };

/**
 * Heat into every sink, warm → cold, with its parts. Sinks are columns (a design has a few),
 * quantities rows, so the table stays narrow beside the form.
 */
function StageHeatTableView({ result }: { result: AssemblyResult }) {
  const system = useUnitSystem();
  const heat = (w: number) => formatQuantity("heat", w, system);
  const band = result.band;
  const rows: Row[] = [
    { label: "Temperature", value: (s) => formatQuantity("temperature", s.temperature_K, system, 5) },
    { label: "Radiation", value: (s) => heat(s.heatIn.radiation_W) },
    { label: "Solid conduction", value: (s) => heat(s.heatIn.solid_W) },
    { label: "Gas conduction", value: (s) => heat(s.heatIn.gas_W) },
    { label: "Supports", value: (s) => heat(s.heatIn.supports_W) },
    { label: "Heat in", value: (s) => heat(s.heatIn.total_W), strong: true },
    { label: "Passed on colder", value: (s) => heat(s.heatOut_W) },
    { label: "Net heat", value: (s) => heat(s.net_W), strong: true },
    { label: "Boil-off (liquid)", value: (s) => (s.boilOff ? formatQuantity("volumePerDay", s.boilOff.liquidVolume_L_per_day, system) : "no cryogen") },
    { label: "Boil-off (mass)", value: (s) => (s.boilOff ? formatQuantity("massPerDay", s.boilOff.evaporatedMass_kg_per_h * 24, system) : "—") },
    ...(band ? [{ label: "Band (low – high)", value: (_s: Stage, i: number) => `${heat(band[i].low_W)} – ${heat(band[i].high_W)}` }] : []),
  ];

  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Heat into each stage, warm to cold</caption>
        <thead>
          <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
            <th scope="col" className="pb-2 pr-3 font-medium">Quantity</th>
            {result.stages.map((s) => (
              <th key={s.label} scope="col" className="pb-2 pr-3 text-right font-medium normal-case">
                {s.label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="font-mono text-xs">
          {rows.map((row) => (
            <tr key={row.label} className="border-t border-ink-800">
              <th scope="row" className={`py-1.5 pr-3 text-left font-sans text-sm ${row.strong ? "font-semibold text-ink-50" : "font-normal text-ink-200"}`}>
                {row.label}
              </th>
              {result.stages.map((s, i) => (
                <td key={s.label} className={`py-1.5 pr-3 text-right ${row.strong ? "font-semibold text-ink-50" : "text-ink-200"}`}>
                  {row.value(s, i)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

// Memoized: a keystroke re-renders the page, not this part, until a new answer changes its props.
export const StageHeatTable = memo(StageHeatTableView);
