import type { ReactNode } from "react";

/** Each screen's one h1, with an optional line saying what the screen is for. */
export function PageHeader({ title, description }: { title: string; description?: ReactNode }) {
  return (
    <header className="mb-6">
      <h1 className="text-2xl font-semibold text-ink-50">{title}</h1>
      {description ? <p className="mt-1 max-w-3xl text-sm text-ink-300">{description}</p> : null}
    </header>
  );
}
