import type { ReactNode } from "react";

/** One part of the design form; a fieldset so its legend names every input inside for screen readers. */
export function FormSection({ title, description, children }: { title: string; description?: ReactNode; children: ReactNode }) {
  return (
    <fieldset className="space-y-4 rounded-lg border border-ink-700 bg-ink-900 p-4">
      <legend className="px-1 text-base font-semibold text-ink-50">{title}</legend>
      {description ? <p className="text-sm text-ink-300">{description}</p> : null}
      {children}
    </fieldset>
  );
}
