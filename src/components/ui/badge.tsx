import type { ReactNode } from "react";

type Tone = "neutral" | "frost" | "ember" | "fault" | "moss";

const TONES: Record<Tone, string> = {
  neutral: "border-ink-500 text-ink-200",
  frost: "border-frost-600 text-frost-200",
  ember: "border-ember-400 text-ember-200",
  fault: "border-fault-400 text-fault-200",
  moss: "border-moss-400 text-moss-200",
};

/** A small label; it always carries a word (and often an icon), the tone only reinforces it. */
export function Badge({ tone = "neutral", children }: { tone?: Tone; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-medium ${TONES[tone]}`}>
      {children}
    </span>
  );
}
