import { memo } from "react";
import type { AssemblyResult } from "../../../../../shared/thermal/assembly";
import { chartColors } from "../../../../components/charts/chart-theme";

// Space bars are hatched so the two kinds differ by pattern, not only by colour.
const hatch = (px: number) => ({ backgroundImage: `repeating-linear-gradient(45deg, ${chartColors.cautionText} 0 ${px}px, transparent ${px}px ${2 * px}px)` });

type Ladder = AssemblyResult["resistances"][number];

const pct = (share: number) => `${(share * 100).toPrecision(share >= 0.1 ? 3 : 2)} %`;

/**
 * Each resistance's share of its ladder's total, as bars. Surface resistances are the faces'
 * (1 − ε)/(εA), space resistances the gaps' 1/(A·F): in a good blanket the faces dominate.
 * Bars are solid for surfaces and hatched for spaces, and each row says its kind in words.
 */
function LadderBars({ ladder, title }: { ladder: Ladder; title: string }) {
  const total = (kind: "surface" | "space") => ladder.resistances.filter((r) => r.kind === kind).reduce((s, r) => s + r.share, 0);
  return (
    <section aria-label={`Resistance ladder of ${title}`} className="space-y-2">
      <h4 className="text-sm font-semibold text-ink-100">{title}</h4>
      <p className="text-xs text-ink-300">
        Surfaces {pct(total("surface"))} · spaces {pct(total("space"))} of {ladder.resistances.length} resistances in series
      </p>
      <ol className="max-h-64 space-y-1 overflow-y-auto pr-2 text-xs">
        {ladder.resistances.map((r) => (
          <li key={r.label} className="grid grid-cols-[9rem_1fr_3.5rem] items-center gap-2">
            <span className="truncate text-ink-200" title={r.label}>
              {r.label}
              <span className="sr-only"> ({r.kind} resistance)</span>
            </span>
            <span className="h-2.5 rounded-sm bg-ink-800" aria-hidden="true">
              <span
                className={`block h-full rounded-sm ${r.kind === "surface" ? "bg-frost-400" : ""}`}
                style={{ width: `${Math.max(r.share * 100, 0.5)}%`, ...(r.kind === "space" ? hatch(3) : {}) }}
              />
            </span>
            <span className="text-right font-mono text-ink-100">{pct(r.share)}</span>
          </li>
        ))}
      </ol>
    </section>
  );
}

function ResistanceLadderView({ result }: { result: AssemblyResult }) {
  if (result.resistances.length === 0) {
    return <p className="text-sm text-ink-300">The ladder is drawn for radiation blocks; this layup's blocks use the correlation or layer-by-layer model.</p>;
  }
  const name = (l: Ladder) => (l.layupIndex === null ? `bare gap ${l.segment + 1}` : (result.blocks.find((b) => b.layupIndex === l.layupIndex)?.label ?? `item ${l.layupIndex + 1}`));
  return (
    <div className="space-y-5">
      <p className="flex gap-4 text-xs text-ink-300">
        <span className="flex items-center gap-1.5"><span className="inline-block size-2.5 rounded-sm bg-frost-400" aria-hidden="true" />surface (solid bar)</span>
        <span className="flex items-center gap-1.5"><span className="inline-block size-2.5 rounded-sm" style={hatch(2)} aria-hidden="true" />space (hatched bar)</span>
      </p>
      {result.resistances.map((l) => (
        <LadderBars key={`${l.segment}-${l.layupIndex}`} ladder={l} title={name(l)} />
      ))}
    </div>
  );
}

// Memoized: a keystroke re-renders the page, not this part, until a new answer changes its props.
export const ResistanceLadder = memo(ResistanceLadderView);
