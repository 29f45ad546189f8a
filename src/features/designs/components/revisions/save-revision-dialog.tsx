import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useId, useRef } from "react";
import { useForm } from "react-hook-form";
import { SaveRevisionInputSchema } from "../../../../../shared/schemas/design";
import { Button } from "../../../../components/ui/button";
import { TextField } from "../../../../components/ui/field";
import { ErrorIcon } from "../../../../components/ui/icons";

const NoteSchema = SaveRevisionInputSchema.pick({ name: true, changeNote: true });
type NoteValues = { name?: string; changeNote: string };

type SaveRevisionDialogProps = {
  open: boolean;
  defaultName: string;
  /** What the new revision will be, in words ("revision 4, from revision 2's content"). */
  summary: string;
  error: string | null;
  onSave: (values: NoteValues) => Promise<void>;
  onClose: () => void;
};

/** Asks what changed before a save: every revision carries a note, so the list reads as a history. */
export function SaveRevisionDialog({ open, defaultName, summary, error, onSave, onClose }: SaveRevisionDialogProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const noteId = useId();
  const { register, handleSubmit, formState, reset } = useForm<NoteValues>({ resolver: zodResolver(NoteSchema), defaultValues: { name: defaultName, changeNote: "" } });

  useEffect(() => {
    const d = dialog.current;
    if (!d) return;
    if (open && !d.open) {
      reset({ name: defaultName, changeNote: "" });
      d.showModal();
    }
    if (!open && d.open) d.close();
  }, [open, defaultName, reset]);

  const noteError = formState.errors.changeNote?.message;
  return (
    <dialog ref={dialog} aria-labelledby={titleId} onClose={onClose} className="m-auto w-full max-w-lg rounded-lg border border-ink-600 bg-ink-900 p-6 text-left text-ink-100 backdrop:bg-ink-950/80">
      <form noValidate onSubmit={handleSubmit(onSave)} className="space-y-4">
        <h2 id={titleId} className="text-lg font-semibold text-ink-50">Save a revision</h2>
        <p className="text-sm text-ink-200">{summary}</p>
        {error ? (
          <p role="alert" className="flex items-start gap-1.5 text-sm text-fault-300">
            <ErrorIcon className="mt-0.5 size-4" />
            <span>{error}</span>
          </p>
        ) : null}
        <div className="space-y-1.5">
          <label htmlFor={noteId} className="block text-sm font-medium text-ink-100">Change note</label>
          <textarea
            id={noteId}
            rows={3}
            aria-invalid={noteError ? true : undefined}
            aria-describedby={noteError ? `${noteId}-error` : `${noteId}-hint`}
            className="block w-full rounded-md border border-ink-600 bg-ink-900 px-3 py-2 text-ink-50 aria-[invalid=true]:border-fault-400"
            {...register("changeNote")}
          />
          {noteError ? (
            <p id={`${noteId}-error`} className="flex items-start gap-1.5 text-sm text-fault-300">
              <ErrorIcon className="mt-0.5 size-4" />
              <span>{noteError}</span>
            </p>
          ) : (
            <p id={`${noteId}-hint`} className="text-sm text-ink-300">Say what changed and why, 1 to 500 characters.</p>
          )}
        </div>
        <TextField label="Design name" error={formState.errors.name?.message} {...register("name")} />
        <div className="flex justify-end gap-3">
          <Button variant="secondary" onClick={onClose} disabled={formState.isSubmitting}>
            Cancel
          </Button>
          <Button type="submit" busy={formState.isSubmitting}>
            Save revision
          </Button>
        </div>
      </form>
    </dialog>
  );
}
