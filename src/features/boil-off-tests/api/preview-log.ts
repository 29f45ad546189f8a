import { useMutation } from "@tanstack/react-query";
import { LogPreviewSchema } from "../../../../shared/schemas/boil-off-test";
import { uploadWithProgress } from "./upload-with-progress";

/** The server previews only the first rows, so only the file's head travels (cut at a line end). */
const HEAD_BYTES = 128 * 1024;

async function headOf(file: File): Promise<File> {
  if (file.size <= HEAD_BYTES) return file;
  const bytes = new Uint8Array(await file.slice(0, HEAD_BYTES).arrayBuffer());
  const end = bytes.lastIndexOf(0x0a);
  return new File([bytes.subarray(0, end > 0 ? end + 1 : bytes.length)], file.name, { type: file.type || "text/csv" });
}

export async function previewLog({ testId, file }: { testId: string; file: File }) {
  const form = new FormData();
  form.append("file", await headOf(file));
  return uploadWithProgress(`/boil-off-tests/${encodeURIComponent(testId)}/logs/preview`, form, LogPreviewSchema);
}

export const usePreviewLog = () => useMutation({ mutationFn: previewLog });
