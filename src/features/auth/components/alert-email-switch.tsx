import { useState } from "react";
import { ErrorIcon } from "../../../components/ui/icons";
import { useUpdatePreferences } from "../api/update-preferences";

/**
 * The signed-in person's alert e-mails. Alerts go to the owners and to the engineers of the
 * design a test belongs to; each of them may opt out here (the alert still shows on Overview).
 */
export function AlertEmailSwitch({ current, receivesAlerts }: { current: boolean; receivesAlerts: boolean }) {
  const update = useUpdatePreferences();
  // The box follows the click at once (React state set in the event itself; the mutation's own
  // state reaches the screen a task later), and goes back to the saved value if the save fails.
  const [asked, setAsked] = useState<boolean | null>(null);
  const shown = asked ?? current;
  if (!receivesAlerts) {
    return <p className="text-sm text-ink-300">Alert e-mails go to the owners and to the engineers of the design a test belongs to; your role receives none.</p>;
  }
  return (
    <div className="space-y-2">
      <label className="flex items-start gap-2 text-sm text-ink-100">
        <input
          type="checkbox"
          className="mt-0.5 accent-frost-400"
          checked={shown}
          disabled={update.isPending}
          onChange={(event) => {
            setAsked(event.target.checked);
            update.mutate({ alertEmails: event.target.checked }, { onSettled: () => setAsked(null) });
          }}
        />
        <span>E-mail me when an accepted boil-off test exceeds the alert threshold</span>
      </label>
      <p className="text-xs text-ink-300">Open alerts show on Overview either way, until someone acknowledges them.</p>
      {update.error ? (
        <p role="alert" className="flex items-start gap-1 text-xs text-fault-300">
          <ErrorIcon className="mt-px size-3.5" />
          <span>Not changed: {update.error.message}</span>
        </p>
      ) : null}
    </div>
  );
}
