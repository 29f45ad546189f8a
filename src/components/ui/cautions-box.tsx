import { useId } from "react";
import { WarningIcon } from "./icons";

/** The cautions beside a set of results: one box, the words chosen by the screen that shows it. */
export function CautionsBox({ cautions }: { cautions: readonly string[] }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="rounded-md border border-ember-400/60 bg-ember-900/30 p-4 text-sm text-ember-200">
      <h3 id={headingId} className="flex items-center gap-2 font-semibold">
        <WarningIcon className="size-4" />
        Cautions
      </h3>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </section>
  );
}
