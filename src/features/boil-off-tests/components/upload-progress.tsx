import type { UploadProgress } from "../api/upload-with-progress";

const mb = (bytes: number) => (bytes / (1024 * 1024)).toFixed(bytes < 10 * 1024 * 1024 ? 1 : 0);

/**
 * The bytes sent so far, from the browser's upload events. At 100 % the server is still
 * parsing and fitting, which the label says, so a long pause there does not look like a hang.
 */
export function UploadProgressBar({ label, progress }: { label: string; progress: UploadProgress | null }) {
  const total = progress?.total ?? 0;
  const loaded = progress?.loaded ?? 0;
  const percent = total > 0 ? Math.round((loaded / total) * 100) : 0;
  const done = total > 0 && loaded >= total;
  return (
    <div className="space-y-1">
      <progress className="h-2 w-full overflow-hidden rounded accent-frost-400" max={100} value={percent} aria-label={label} aria-valuetext={`${percent} %`} />
      <p className="text-sm text-ink-300" role="status">
        {total === 0 ? "Starting the upload…" : done ? `Sent ${mb(total)} MB; checking every line and fitting…` : `Sent ${mb(loaded)} of ${mb(total)} MB (${percent} %)`}
      </p>
    </div>
  );
}
