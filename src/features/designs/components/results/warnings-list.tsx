import { WarningIcon } from "../../../../components/ui/icons";

/** The engine's own warnings about this design (a bath off its boiling point, a fit extrapolated). */
export function WarningsList({ warnings }: { warnings: string[] }) {
  if (warnings.length === 0) return null;
  return (
    <section aria-label="Warnings about this design" className="rounded-md border border-ember-400 p-3 text-sm text-ember-200">
      <ul className="space-y-1.5">
        {warnings.map((w) => (
          <li key={w} className="flex items-start gap-2">
            <WarningIcon className="mt-0.5 size-4" />
            <span>
              <span className="font-semibold">Warning: </span>
              {w}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
