import { useId, useState } from "react";
import { ATTACHMENT_MAX_BYTES, ATTACHMENT_TYPES, type TestDetail } from "../../../../shared/schemas/boil-off-test";
import { formatDateTime } from "../../../lib/format-time";
import { attachmentHref, useUploadAttachment } from "../api/upload-attachment";
import type { UploadProgress } from "../api/upload-with-progress";
import { LogProblems } from "./log-problems";
import { UploadProgressBar } from "./upload-progress";

const kb = (bytes: number) => (bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} kB` : `${(bytes / (1024 * 1024)).toFixed(1)} MB`);

/** Photos and PDFs kept with the test; each is stored with its checksum and downloads as sent. */
export function AttachmentsPanel({ test, canUpload }: { test: TestDetail; canUpload: boolean }) {
  const inputId = useId();
  const upload = useUploadAttachment();
  const [progress, setProgress] = useState<UploadProgress | null>(null);

  const choose = (input: HTMLInputElement) => {
    const file = input.files?.[0];
    upload.reset();
    if (!file) return;
    setProgress(null);
    upload.mutate({ testId: test.id, file, onProgress: setProgress }, { onSuccess: () => { input.value = ""; } });
  };

  return (
    <div className="space-y-4">
      {test.attachments.length === 0 ? <p className="text-sm text-ink-300">No attachment yet.</p> : (
        <ul aria-label="Attachments" className="divide-y divide-ink-800 text-sm">
          {test.attachments.map((f) => (
            <li key={f.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
              <a href={attachmentHref(test.id, f.id)} download={f.filename} className="font-medium text-frost-300 underline decoration-frost-700 underline-offset-4">{f.filename}</a>
              <span className="text-ink-300">
                {kb(f.size_bytes)} · {f.uploadedBy ?? "someone"}, {formatDateTime(f.uploadedAt)} · <span className="font-mono text-xs" title={`SHA-256 ${f.sha256}`}>sha256 {f.sha256.slice(0, 12)}…</span>
              </span>
            </li>
          ))}
        </ul>
      )}
      {test.log ? (
        <p className="text-sm text-ink-300">
          Logger file: <span className="text-ink-100">{test.log.filename}</span> ({test.log.rows.toLocaleString("en-US")} readings, sha256 <span className="font-mono text-xs">{test.log.sha256.slice(0, 12)}…</span>)
        </p>
      ) : null}
      {canUpload ? (
        <div className="space-y-1.5">
          <label htmlFor={inputId} className="block text-sm font-medium text-ink-100">Add an attachment</label>
          <input id={inputId} type="file" accept={ATTACHMENT_TYPES.join(",")} onChange={(e) => choose(e.currentTarget)} aria-describedby={`${inputId}-hint`}
            className="block text-sm text-ink-100 file:mr-3 file:rounded-md file:border file:border-ink-600 file:bg-ink-800 file:px-3 file:py-1.5 file:text-ink-100" />
          <p id={`${inputId}-hint`} className="text-sm text-ink-300">A photo (PNG, JPEG, WebP) or a PDF, up to {ATTACHMENT_MAX_BYTES / (1024 * 1024)} MB unless your site set another limit.</p>
          {upload.isPending ? <UploadProgressBar label="Attachment upload" progress={progress} /> : null}
          {upload.error ? <LogProblems error={upload.error} title="The attachment was not stored" /> : null}
        </div>
      ) : null}
    </div>
  );
}
