import type { ReactNode } from "react";
import { ErrorIcon, InfoIcon, SuccessIcon, WarningIcon } from "./icons";

type Tone = "error" | "warning" | "success" | "info";

const TONES: Record<Tone, { box: string; Icon: typeof InfoIcon; word: string }> = {
  error: { box: "border-fault-400 bg-fault-900/60 text-fault-200", Icon: ErrorIcon, word: "Error" },
  warning: { box: "border-ember-400 bg-ember-900/60 text-ember-200", Icon: WarningIcon, word: "Caution" },
  success: { box: "border-moss-400 bg-moss-900/60 text-moss-200", Icon: SuccessIcon, word: "Done" },
  info: { box: "border-frost-600 bg-frost-900/50 text-frost-100", Icon: InfoIcon, word: "Note" },
};

/**
 * A message box whose tone is said three ways: colour, icon and a hidden word for screen
 * readers. Errors interrupt (role=alert); the rest are polite status updates.
 */
export function Callout({ tone, title, children }: { tone: Tone; title?: string; children?: ReactNode }) {
  const { box, Icon, word } = TONES[tone];
  return (
    <div role={tone === "error" ? "alert" : "status"} className={`flex gap-3 rounded-md border px-4 py-3 text-sm ${box}`}>
      <Icon className="mt-0.5 size-4" />
      <div className="space-y-1">
        <span className="sr-only">{word}: </span>
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div>{children}</div> : null}
      </div>
    </div>
  );
}
