import { useId, useRef, useState, type ReactNode } from "react";
import { Button } from "./button";
import { ErrorIcon } from "./icons";

type ConfirmButtonProps = {
  label: string;
  /** Accessible name of the trigger when the visible label alone is ambiguous in a list. */
  triggerLabel?: string;
  title: string;
  description: ReactNode;
  confirmLabel: string;
  onConfirm: () => Promise<unknown>;
};

/**
 * A destructive action behind a native modal dialog (focus trap and Escape for free). The
 * dialog stays open until the server agrees, and shows the server's refusal inside it.
 */
export function ConfirmButton({ label, triggerLabel, title, description, confirmLabel, onConfirm }: ConfirmButtonProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const open = () => {
    setError(null);
    dialog.current?.showModal();
  };
  const confirm = async () => {
    setBusy(true);
    setError(null);
    try {
      await onConfirm();
      dialog.current?.close();
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : "That did not work. Try again.");
    } finally {
      setBusy(false);
    }
  };

  return (
    <>
      <Button variant="danger" size="sm" onClick={open} aria-label={triggerLabel}>
        {label}
      </Button>
      <dialog
        ref={dialog}
        aria-labelledby={titleId}
        className="m-auto w-full max-w-md rounded-lg border text-left border-ink-600 bg-ink-900 p-6 text-ink-100 backdrop:bg-ink-950/80"
      >
        <h2 id={titleId} className="text-lg font-semibold text-ink-50">
          {title}
        </h2>
        <div className="mt-2 text-sm text-ink-200">{description}</div>
        {error ? (
          <p role="alert" className="mt-3 flex items-start gap-1.5 text-sm text-fault-300">
            <ErrorIcon className="mt-0.5 size-4" />
            <span>{error}</span>
          </p>
        ) : null}
        <div className="mt-6 flex justify-end gap-3">
          <Button variant="secondary" onClick={() => dialog.current?.close()} disabled={busy}>
            Cancel
          </Button>
          <Button variant="danger" onClick={confirm} busy={busy}>
            {confirmLabel}
          </Button>
        </div>
      </dialog>
    </>
  );
}
