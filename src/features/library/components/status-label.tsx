import type { MaterialSummary } from "../../../../shared/schemas/material";
import { SCOPE_LABELS } from "../utils/library-text";

type Status = MaterialSummary["status"];

// Each status has its own shape and word; the colour only repeats what they already say.
const STATUS: Record<Status, { word: string; tone: string; shape: React.ReactNode }> = {
  approved: { word: "Approved", tone: "text-moss-300", shape: <circle cx="6" cy="6" r="4.5" fill="currentColor" /> },
  draft: { word: "Draft", tone: "text-frost-300", shape: <circle cx="6" cy="6" r="4" fill="none" stroke="currentColor" strokeWidth="1.6" /> },
  rejected: {
    word: "Rejected",
    tone: "text-fault-300",
    shape: (
      <g fill="none" stroke="currentColor" strokeWidth="1.5">
        <rect x="1.5" y="1.5" width="9" height="9" />
        <path d="M3.5 3.5l5 5M8.5 3.5l-5 5" />
      </g>
    ),
  },
  retired: { word: "Retired", tone: "text-ink-300", shape: <path d="M2 6h8" stroke="currentColor" strokeWidth="2" strokeLinecap="round" /> },
};

export const STATUS_WORDS: Record<Status, string> = {
  approved: STATUS.approved.word,
  draft: STATUS.draft.word,
  rejected: STATUS.rejected.word,
  retired: STATUS.retired.word,
};

/** A status as shape plus word, e.g. a filled circle and "Approved". */
export function StatusLabel({ status }: { status: Status }) {
  const { word, tone, shape } = STATUS[status];
  return (
    <span className={`inline-flex items-center gap-1.5 text-sm font-medium ${tone}`}>
      <svg viewBox="0 0 12 12" className="size-3 shrink-0" aria-hidden="true" focusable="false">
        {shape}
      </svg>
      <span className="text-ink-100">{word}</span>
    </span>
  );
}

/** Seed entries are shared and read-only; ours can change. Said in words, with a small mark. */
export function ScopeLabel({ scope }: { scope: MaterialSummary["scope"] }) {
  return scope === "seed" ? (
    <span className="inline-flex items-center gap-1 text-sm text-ink-300">
      <span aria-hidden="true">◇</span> {SCOPE_LABELS.seed}
    </span>
  ) : (
    <span className="inline-flex items-center gap-1 text-sm text-ink-100">
      <span aria-hidden="true">◆</span> {SCOPE_LABELS.organization}
    </span>
  );
}
