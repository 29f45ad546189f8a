import { useId, useState } from "react";
import { Link } from "react-router-dom";
import { MATERIAL_CSV_COLUMNS, MATERIAL_CSV_MAX_ROWS, type ImportResult } from "../../../../shared/schemas/material";
import { ErrorMessage } from "../../../components/errors/error-message";
import { Button } from "../../../components/ui/button";
import { Callout } from "../../../components/ui/callout";
import { Loading } from "../../../components/ui/spinner";
import { linkClass } from "../../../components/ui/text-link";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useImportMaterials, usePreviewImport } from "../api/import-materials";
import { ImportPreviewTable } from "./import-preview-table";

/** A file-level refusal (bad header, not UTF-8 …) names each problem with its line. */
function FileProblems({ error }: { error: unknown }) {
  return (
    <div className="space-y-2">
      <ErrorMessage error={error} title="The file cannot be imported" />
      {/* One problem is already in the message; more get a full list (the message shows five). */}
      {isApiError(error) && error.fields.length > 1 ? (
        <ul className="list-disc pl-5 text-sm text-fault-200">{error.fields.map((f) => <li key={f.path + f.message}>{f.message}</li>)}</ul>
      ) : null}
    </div>
  );
}

function Imported({ result }: { result: ImportResult }) {
  return (
    <Callout tone="success" title={`Imported ${result.imported} ${result.imported === 1 ? "entry" : "entries"} as drafts`}>
      <p>An owner approves each before designs can pick it.</p>
      <ul className="mt-1 list-disc pl-4">
        {result.materials.map((m) => (
          <li key={m.id}><Link className={linkClass} to={paths.app.libraryEntry.getHref(m.id)}>{m.name}</Link></li>
        ))}
      </ul>
    </Callout>
  );
}

/** Upload, see the dry run row by row, then import only when every row is valid. */
export function ImportPanel() {
  const inputId = useId();
  const [file, setFile] = useState<File | null>(null);
  const preview = usePreviewImport();
  const run = useImportMaterials();
  const valid = preview.data?.valid === true && preview.data.rowCount > 0;

  const choose = (picked: File | null) => {
    setFile(picked);
    run.reset();
    if (picked) preview.mutate(picked);
    else preview.reset();
  };

  return (
    <div className="space-y-4">
      <div className="space-y-1.5">
        <label htmlFor={inputId} className="block text-sm font-medium text-ink-100">Library CSV file</label>
        <input
          id={inputId}
          type="file"
          accept=".csv,text/csv"
          aria-describedby={`${inputId}-hint`}
          className="block text-sm text-ink-100 file:mr-3 file:rounded-md file:border file:border-ink-600 file:bg-ink-800 file:px-3 file:py-1.5 file:text-ink-100"
          onChange={(e) => choose(e.target.files?.[0] ?? null)}
        />
        <p id={`${inputId}-hint`} className="text-sm text-ink-300">
          UTF-8, comma-separated, up to {MATERIAL_CSV_MAX_ROWS} rows. Columns: <span className="font-mono text-xs">{MATERIAL_CSV_COLUMNS.join(", ")}</span>. The
          Library's Export CSV writes this format. Every row becomes a new draft.
        </p>
      </div>
      {preview.isPending ? <Loading label="Checking every row…" /> : null}
      {preview.error ? <FileProblems error={preview.error} /> : null}
      {preview.data ? (
        <>
          <p className="text-sm text-ink-200" role="status">
            {preview.data.valid ? `All ${preview.data.rowCount} rows are valid.` : `${preview.data.rows.filter((r) => r.problems.length > 0).length} of ${preview.data.rowCount} rows have problems; fix them in the file and choose it again.`}
          </p>
          <ImportPreviewTable preview={preview.data} />
          <Button disabled={!valid || run.isSuccess} busy={run.isPending} onClick={() => file && run.mutate(file)}>
            Import {preview.data.rowCount} {preview.data.rowCount === 1 ? "entry" : "entries"}
          </Button>
        </>
      ) : null}
      {run.error ? <FileProblems error={run.error} /> : null}
      {run.data ? <Imported result={run.data} /> : null}
    </div>
  );
}
