import { useState } from "react";
import { Button } from "../../../components/ui/button";
import { TextAreaField } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";
import { useUpdateNotes } from "../api/update-notes";

/** The test's notes; a refused save keeps the text as typed, with the reason under it. */
export function NotesPanel({ testId, notes, canEdit }: { testId: string; notes: string; canEdit: boolean }) {
  // What was typed, against the stored notes it started from: once the stored notes change
  // (this save, or a colleague's), the stored text shows again.
  const [draft, setDraft] = useState<{ text: string; base: string } | null>(null);
  const text = draft && draft.base === notes ? draft.text : notes;
  const save = useUpdateNotes();
  if (!canEdit) return <p className="whitespace-pre-wrap text-sm text-ink-200">{notes || "No notes."}</p>;
  const error = save.error ? (isApiError(save.error) ? (save.error.fields.find((f) => f.path === "notes")?.message ?? save.error.message) : "The notes were not saved. Try again.") : undefined;
  return (
    <form
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate({ testId, notes: text });
      }}
    >
      <TextAreaField label="Notes" rows={4} value={text} onChange={(e) => { save.reset(); setDraft({ text: e.target.value, base: notes }); }} error={error} />
      <div className="flex items-center gap-3">
        <Button type="submit" variant="secondary" busy={save.isPending} disabled={text === notes}>Save notes</Button>
        {save.isSuccess && text === notes ? <span role="status" className="text-sm text-moss-300">Saved.</span> : null}
      </div>
    </form>
  );
}
