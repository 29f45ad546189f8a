import { useId, useState } from "react";
import { LOG_MAX_BYTES, LogUploadFieldsSchema, type LogPreview, type TestMethod } from "../../../../shared/schemas/boil-off-test";
import { Button } from "../../../components/ui/button";
import { Loading } from "../../../components/ui/spinner";
import { isApiError } from "../../../lib/api-client";
import { usePreviewLog } from "../api/preview-log";
import { useUploadLog } from "../api/upload-log";
import type { UploadProgress } from "../api/upload-with-progress";
import { ColumnMapping, mappingFrom, type Mapping } from "./column-mapping";
import { LogPreviewTable } from "./log-preview-table";
import { LogProblems } from "./log-problems";
import { UploadProgressBar } from "./upload-progress";

const MAPPING_KEYS = ["timeColumn", "timeFormat", "valueColumn", "valueUnit", "pressureColumn", "pressureUnit"] as const;

/** Field issues (from the shared schema here, or from the server) beside the select they are about. */
function issuesByField(issues: { path: string; message: string }[]): Partial<Record<keyof Mapping, string>> {
  const out: Partial<Record<keyof Mapping, string>> = {};
  for (const issue of issues) {
    const key = MAPPING_KEYS.find((k) => k === issue.path);
    if (key && !out[key]) out[key] = issue.message;
  }
  return out;
}

/**
 * Choose a logger CSV, see its first rows with the detected columns picked, adjust the mapping,
 * and send the whole file with a progress bar. A refusal keeps the file and the mapping as they
 * were, so the user fixes one thing and sends again.
 */
export function LogUploadPanel({ testId, method, replacing }: { testId: string; method: TestMethod; replacing: boolean }) {
  const inputId = useId();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<LogPreview | null>(null);
  const [mapping, setMapping] = useState<Mapping | null>(null);
  const [localIssues, setLocalIssues] = useState<{ path: string; message: string }[]>([]);
  const [progress, setProgress] = useState<UploadProgress | null>(null);
  const previewLog = usePreviewLog();
  const upload = useUploadLog();

  const choose = (picked: File | null) => {
    setFile(picked);
    setPreview(null);
    setMapping(null);
    setLocalIssues([]);
    upload.reset();
    previewLog.reset();
    if (!picked) return;
    previewLog.mutate({ testId, file: picked }, { onSuccess: (p) => { setPreview(p); setMapping(mappingFrom(p, method)); } });
  };

  const send = () => {
    if (!file || !mapping) return;
    const parsed = LogUploadFieldsSchema.safeParse(mapping);
    if (!parsed.success) {
      setLocalIssues(parsed.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })));
      return;
    }
    setLocalIssues([]);
    setProgress(null);
    upload.mutate({ testId, file, fields: parsed.data, onProgress: setProgress });
  };

  const serverIssues = isApiError(upload.error) ? upload.error.fields : [];
  const fieldErrors = issuesByField([...localIssues, ...serverIssues]);

  return (
    <div className="space-y-4">
      <div className="space-y-1.5">
        <label htmlFor={inputId} className="block text-sm font-medium text-ink-100">{replacing ? "Replace the log with another file" : "Logger file (CSV)"}</label>
        <input
          id={inputId}
          type="file"
          accept=".csv,.txt,text/csv,text/plain"
          aria-describedby={`${inputId}-hint`}
          className="block text-sm text-ink-100 file:mr-3 file:rounded-md file:border file:border-ink-600 file:bg-ink-800 file:px-3 file:py-1.5 file:text-ink-100"
          onChange={(e) => choose(e.target.files?.[0] ?? null)}
        />
        <p id={`${inputId}-hint`} className="text-sm text-ink-300">
          A header line naming the columns, then one reading per line; comma, semicolon or tab separated; up to {LOG_MAX_BYTES / (1024 * 1024)} MB unless your site set another limit. Nothing is stored unless every line is valid.
        </p>
      </div>
      {previewLog.isPending ? <Loading label="Reading the first rows…" /> : null}
      {previewLog.error ? <LogProblems error={previewLog.error} title="The file cannot be read" /> : null}
      {preview && mapping ? (
        <>
          <LogPreviewTable preview={preview} roles={{ time: mapping.timeColumn, value: mapping.valueColumn, pressure: mapping.pressureColumn }} />
          <ColumnMapping header={preview.header} method={method} mapping={mapping} errors={fieldErrors} onChange={setMapping} />
          {upload.isPending ? <UploadProgressBar label="Log upload" progress={progress} /> : null}
          {upload.error ? <LogProblems error={upload.error} title="The log was not stored" /> : null}
          <Button onClick={send} busy={upload.isPending} disabled={upload.isSuccess}>
            {upload.isSuccess ? "Log stored" : "Upload and analyse"}
          </Button>
        </>
      ) : null}
    </div>
  );
}
