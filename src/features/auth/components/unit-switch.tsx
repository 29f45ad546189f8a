import type { UnitSystem } from "../../../../shared/units";
import { ErrorIcon } from "../../../components/ui/icons";
import { useUpdatePreferences } from "../api/update-preferences";

const CHOICES: [UnitSystem, string][] = [
  ["si", "SI"],
  ["us", "US customary"],
];

/** The signed-in person's units; the engine and the stored data stay SI, only display changes. */
export function UnitSwitch({ current }: { current: UnitSystem }) {
  const update = useUpdatePreferences();
  const shown = update.isPending && update.variables.unitSystem !== undefined ? update.variables.unitSystem : current;
  return (
    <fieldset className="space-y-1.5">
      <legend className="text-xs text-ink-300">Units</legend>
      <div className="flex rounded-md border border-ink-600 p-0.5">
        {CHOICES.map(([value, words]) => (
          <label key={value} className={`flex flex-1 cursor-pointer items-center justify-center gap-1 rounded px-2 py-1 text-xs has-focus-visible:outline-2 has-focus-visible:outline-frost-300 ${shown === value ? "bg-frost-400 font-semibold text-ink-950" : "text-ink-200 hover:bg-ink-800"}`}>
            <input type="radio" name="unit-system" value={value} checked={shown === value} disabled={update.isPending} onChange={() => update.mutate({ unitSystem: value })} className="sr-only" />
            {shown === value ? <span aria-hidden="true">✓</span> : null}
            {words}
          </label>
        ))}
      </div>
      {update.error ? (
        <p role="alert" className="flex items-start gap-1 text-xs text-fault-300">
          <ErrorIcon className="mt-px size-3.5" />
          <span>Units not changed: {update.error.message}</span>
        </p>
      ) : null}
    </fieldset>
  );
}
