import { WarningIcon } from "../ui/icons";

/** Frostfold gives estimates; this line says who has the last word, on every page. */
export function CautionFooter() {
  return (
    <footer className="border-t border-ink-800 px-6 py-4 text-xs text-ink-300">
      <p className="flex items-start gap-2">
        <WarningIcon className="mt-px size-3.5 text-ember-300" />
        <span>
          Estimates only. Local codes, the site's oxygen-deficiency procedure and licensed engineering practice govern.
        </span>
      </p>
    </footer>
  );
}
