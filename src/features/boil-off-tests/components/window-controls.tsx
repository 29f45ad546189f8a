import { MINIMUM_LOG_READINGS } from "../../../../shared/schemas/boil-off-test";
import { Button } from "../../../components/ui/button";
import { formatHours } from "../utils/display-units";

type Window = { start_s: number; end_s: number };

/**
 * Two sliders for the window's ends (in seconds from the first reading, shown in hours). The
 * band on the chart follows them at once; the fit changes only when the window is set.
 */
export function WindowControls({ duration_s, draft, onDraft, stored, suggested, canSet, busy, onSet, onReset }: {
  duration_s: number;
  draft: Window;
  onDraft: (w: Window) => void;
  stored: Window;
  suggested: boolean;
  canSet: boolean;
  busy: boolean;
  onSet: (w: Window) => void;
  onReset: () => void;
}) {
  const step = Math.max(1, Math.round(duration_s / 2000));
  const changed = draft.start_s !== stored.start_s || draft.end_s !== stored.end_s;
  const valid = draft.end_s > draft.start_s;
  return (
    <div className="space-y-3">
      <div className="grid gap-4 sm:grid-cols-2">
        <label className="block space-y-1 text-sm">
          <span className="font-medium text-ink-100">Window start</span>
          <input type="range" min={0} max={duration_s} step={step} value={draft.start_s} disabled={!canSet} className="w-full accent-frost-400" aria-valuetext={formatHours(draft.start_s)}
            onChange={(e) => onDraft({ ...draft, start_s: Number(e.target.value) })} />
          <span className="font-mono text-ink-200">{formatHours(draft.start_s)}</span>
        </label>
        <label className="block space-y-1 text-sm">
          <span className="font-medium text-ink-100">Window end</span>
          <input type="range" min={0} max={duration_s} step={step} value={draft.end_s} disabled={!canSet} className="w-full accent-frost-400" aria-valuetext={formatHours(draft.end_s)}
            onChange={(e) => onDraft({ ...draft, end_s: Number(e.target.value) })} />
          <span className="font-mono text-ink-200">{formatHours(draft.end_s)}</span>
        </label>
      </div>
      <p className="text-sm text-ink-300">
        {suggested ? "This is Frostfold's suggested window: where the local slope stays steady after the cool-down." : "This window was set by hand."} A fit needs at least {MINIMUM_LOG_READINGS} readings in it.
      </p>
      {!valid ? <p role="alert" className="text-sm text-fault-300">Window end must be after window start.</p> : null}
      {canSet ? (
        <div className="flex flex-wrap gap-3">
          <Button onClick={() => onSet(draft)} busy={busy} disabled={!changed || !valid}>Set window and refit</Button>
          <Button variant="secondary" onClick={() => onDraft(stored)} disabled={!changed || busy}>Undo the change</Button>
          {!suggested ? <Button variant="ghost" onClick={onReset} disabled={busy}>Back to the suggested window</Button> : null}
        </div>
      ) : null}
    </div>
  );
}
