import type { ReactNode } from "react";

/** A titled panel; the heading level is the caller's so each page keeps a sound outline. */
export function Card({ title, as: Heading = "h2", actions, children, className = "" }: {
  title?: string;
  as?: "h1" | "h2" | "h3";
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
}) {
  return (
    <section className={`rounded-lg border border-ink-700 bg-ink-900 p-5 shadow-sm shadow-black/30 ${className}`}>
      {title || actions ? (
        <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
          {title ? <Heading className="text-base font-semibold text-ink-50">{title}</Heading> : null}
          {actions}
        </div>
      ) : null}
      {children}
    </section>
  );
}
