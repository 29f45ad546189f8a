import type { CompareResult } from "../../../../shared/schemas/design";
import { formatNumber, formatQuantity } from "../../../lib/format-quantity";
import { useUnitSystem } from "../../../lib/unit-system";
import { stageLabels } from "./stage-labels";

type Item = CompareResult["items"][number];
type Row = { label: string; cell: (item: Item) => string; strong?: boolean };

/** Side by side, one column per design: heat per stage, boil-off, hold time, yearly cost, blanket. */
export function CompareTable({ result }: { result: CompareResult }) {
  const system = useUnitSystem();
  const labels = stageLabels(result);
  const stage = (item: Item, label: string) => item.stages.find((s) => s.label === label);
  const rows: Row[] = [
    { label: "Revision", cell: (i) => String(i.revision) },
    ...labels.map((l): Row => ({ label: `Heat into ${l}`, strong: true, cell: (i) => formatQuantity("heat", stage(i, l)?.heatIn_W, system) })),
    ...labels.map((l): Row => ({ label: `Boil-off at ${l}`, cell: (i) => { const s = stage(i, l); return s?.boilOff_L_per_day == null ? "—" : `${formatQuantity("volumePerDay", s.boilOff_L_per_day, system)}${s.cryogen ? ` of ${s.cryogen}` : ""}`; } })),
    { label: "Hold time", cell: (i) => (i.holdTime_h === null ? "—" : Number.isFinite(i.holdTime_h) ? `${formatNumber(i.holdTime_h)} h (${formatNumber(i.holdTime_h / 24)} days)` : "no boil-off") },
    { label: "Yearly boil-off", cell: (i) => formatQuantity("volume", i.yearlyBoilOff_L, system) },
    { label: "Yearly cryogen cost", strong: true, cell: (i) => (i.yearlyCryogenCost === null ? (result.price_per_L === null ? "set a price" : "—") : formatNumber(i.yearlyCryogenCost)) },
    { label: "Blanket mass", cell: (i) => (i.blanketMass_kg === null ? "— (no areal mass in the library)" : formatQuantity("mass", i.blanketMass_kg, system)) },
    { label: "Blanket cost", cell: (i) => (i.blanketCost === null ? "— (no cost in the library)" : formatNumber(i.blanketCost)) },
  ];
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Compared designs side by side</caption>
        <thead>
          <tr className="text-left text-xs uppercase tracking-wider text-ink-300">
            <th scope="col" className="pb-2 pr-4 font-medium">Quantity</th>
            {result.items.map((i) => (
              <th key={`${i.designId}:${i.revision}`} scope="col" className="pb-2 pr-4 text-right font-medium normal-case text-ink-100">
                {i.name}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.label} className="border-t border-ink-800">
              <th scope="row" className={`py-2 pr-4 text-left ${row.strong ? "font-semibold text-ink-50" : "font-normal text-ink-200"}`}>{row.label}</th>
              {result.items.map((i) => (
                <td key={`${i.designId}:${i.revision}`} className={`py-2 pr-4 text-right font-mono text-xs ${row.strong ? "text-ink-50" : "text-ink-200"}`}>{row.cell(i)}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
