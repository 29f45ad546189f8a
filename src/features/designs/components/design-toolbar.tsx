import { useState } from "react";
import type { DesignDetail, RevisionDetail } from "../../../../shared/schemas/design";
import { Badge } from "../../../components/ui/badge";
import { Button, buttonClass } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { isApiError } from "../../../lib/api-client";
import { formatDateTime } from "../../../lib/format-time";
import { useDuplicateDesign } from "../api/duplicate-design";
import { reportHref } from "../api/report-href";
import { useSaveRevision } from "../api/save-revision";
import { markDesignErrors } from "../lib/server-field-errors";
import type { DesignFormApi } from "./design-editor";
import { SaveRevisionDialog } from "./revisions/save-revision-dialog";
import { StaleRevisionNotice } from "./revisions/stale-revision-notice";

type DesignToolbarProps = {
  form: DesignFormApi;
  design: DesignDetail;
  shown: RevisionDetail;
  canEdit: boolean;
  newestHref: string;
  onSaved: (revision: RevisionDetail) => unknown;
  onDuplicated: (design: DesignDetail) => unknown;
  onReloadNewest: () => unknown;
};

/**
 * Save (with a change note, on top of the latest revision this page loaded), duplicate and the
 * PDF of the shown revision. A stale save keeps every edit on screen and says what to do.
 */
export function DesignToolbar({ form, design, shown, canEdit, newestHref, onSaved, onDuplicated, onReloadNewest }: DesignToolbarProps) {
  const save = useSaveRevision();
  const duplicate = useDuplicateDesign();
  const [dialogOpen, setDialogOpen] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [dialogError, setDialogError] = useState<string | null>(null);
  const stale = isApiError(save.error, "stale_revision") ? save.error : null;
  const next = design.latestRevision + 1;

  const openSave = async () => {
    setProblem(null);
    save.reset();
    if (!(await form.trigger())) return setProblem("Fix the marked fields before saving: the results panel lists them.");
    setDialogError(null);
    setDialogOpen(true);
  };
  const onSave = (note: { name?: string; changeNote: string }) =>
    form.handleSubmit(async (content) => {
      try {
        const revision = await save.mutateAsync({ designId: design.id, input: { baseRevision: design.latestRevision, content, changeNote: note.changeNote, ...(note.name && note.name !== design.name ? { name: note.name } : {}) } });
        setDialogOpen(false);
        await onSaved(revision);
      } catch (error) {
        if (isApiError(error, "stale_revision")) return setDialogOpen(false);
        setDialogError(markDesignErrors(error, form.setError, "content.").join(" "));
      }
    })();

  return (
    <div className="mb-6 space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-sm text-ink-200">
          Revision {shown.revision} of {design.latestRevision}
          {shown.revision !== design.latestRevision ? " (an older revision)" : ""} · saved {formatDateTime(shown.createdAt)} by {shown.createdBy ?? "—"}
        </p>
        {form.formState.isDirty && canEdit ? <Badge tone="ember">● Unsaved changes</Badge> : null}
        <div className="ml-auto flex flex-wrap gap-2">
          {canEdit ? <Button onClick={openSave}>Save revision…</Button> : null}
          {canEdit ? (
            <Button variant="secondary" busy={duplicate.isPending} onClick={() => duplicate.mutate({ designId: design.id }, { onSuccess: onDuplicated })}>
              Duplicate
            </Button>
          ) : null}
          <a href={reportHref(design.id, shown.revision)} download className={buttonClass("secondary")}>
            PDF report
          </a>
        </div>
      </div>
      {problem ? <Callout tone="error" title="Not saved">{problem}</Callout> : null}
      {duplicate.error ? <Callout tone="error" title="Could not duplicate">{duplicate.error.message}</Callout> : null}
      {stale ? <StaleRevisionNotice message={stale.message} newestHref={newestHref} onReload={onReloadNewest} /> : null}
      <SaveRevisionDialog
        open={dialogOpen}
        defaultName={design.name}
        summary={shown.revision === design.latestRevision ? `This saves revision ${next}.` : `This saves revision ${next} from revision ${shown.revision}'s content with your edits.`}
        error={dialogError}
        onSave={onSave}
        onClose={() => setDialogOpen(false)}
      />
    </div>
  );
}
