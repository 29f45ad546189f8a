import type { Prediction } from "../../../../../shared/design/prediction";
import { Callout } from "../../../../components/ui/callout";
import { Cautions } from "./cautions";
import { ColdSummary } from "./cold-summary";
import { LayerCountSweep } from "./layer-count-sweep";
import { MoreSweeps } from "./more-sweeps";
import { ResistanceLadder } from "./resistance-ladder";
import { StageHeatTable } from "./stage-heat-table";
import { WallSection } from "./wall-section";
import { WarningsList } from "./warnings-list";

/** fresh: the figures are the form's; updating: a newer estimate is on its way; stale: the form has problems. */
export type ResultsState = "fresh" | "updating" | "stale";

/** sweepUpdating: the figures are the form's, the layer-count sweep is still the previous one's. */
type ResultsPanelProps = { prediction: Prediction | null; state: ResultsState; problems: string[]; sweepUpdating?: boolean };

function Section({ title, note, children }: { title: string; note?: string; children: React.ReactNode }) {
  return (
    <section className="space-y-3 border-t border-ink-800 pt-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-sm font-semibold uppercase tracking-wider text-ink-300">{title}</h3>
        {note ? <p className="text-xs text-ink-300">{note}</p> : null}
      </div>
      {children}
    </section>
  );
}

/**
 * The live results beside the form. When the form has problems, the last good figures stay,
 * dimmed, under a note that says so in words (never by the dimming alone).
 */
export function ResultsPanel({ prediction, state, problems, sweepUpdating = false }: ResultsPanelProps) {
  const result = prediction?.result;
  const swept = prediction?.sweep ? result?.blocks.find((b) => b.layupIndex === prediction.sweep?.layupIndex) : undefined;
  return (
    <section aria-labelledby="results-heading" aria-busy={state === "updating"} className="space-y-4 rounded-lg border border-ink-700 bg-ink-900 p-5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="results-heading" className="text-base font-semibold text-ink-50">Results</h2>
        <p className="text-xs text-ink-300">{state === "fresh" ? "Up to date with the form" : state === "updating" ? "Updating…" : "Not up to date"}</p>
      </div>
      {state === "stale" ? (
        <Callout tone="warning" title={prediction ? "These figures are for the last valid design" : "No figures yet"}>
          {problems.length > 0 ? (
            <ul className="list-disc pl-4">
              {problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          ) : (
            "Fix the marked fields in the form to update them."
          )}
        </Callout>
      ) : null}
      {prediction && result ? (
        <div className={`space-y-4 transition-opacity ${state === "stale" ? "opacity-45" : state === "updating" ? "opacity-80" : ""}`}>
          <ColdSummary prediction={prediction} />
          <WarningsList warnings={result.warnings} />
          <Section title="Heat into each stage">
            <StageHeatTable result={result} />
          </Section>
          <Section title="Wall section">
            <WallSection result={result} warm_K={result.blocks[0]?.warm_K ?? result.stages[0].temperature_K} />
          </Section>
          <Section title="Resistance ladder">
            <ResistanceLadder result={result} />
          </Section>
          {prediction.sweep ? (
            <Section title="Layer-count sweep" note={sweepUpdating ? "Updating the sweep…" : undefined}>
              <LayerCountSweep sweep={prediction.sweep} blockName={swept?.label ?? "the main block"} currentLayers={swept?.layers ?? null} />
            </Section>
          ) : null}
          <Section title="More sweeps"><MoreSweeps accepted={state === "fresh"} /></Section>
        </div>
      ) : null}
      <Cautions />
    </section>
  );
}
