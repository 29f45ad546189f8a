import { useMutation, useQueryClient } from "@tanstack/react-query";
import { StoredFileSchema } from "../../../../shared/schemas/boil-off-test";
import { testKeys } from "./test-keys";
import { uploadWithProgress, type UploadProgress } from "./upload-with-progress";

export function uploadAttachment({ testId, file, onProgress }: { testId: string; file: File; onProgress?: (p: UploadProgress) => void }) {
  const form = new FormData();
  form.append("file", file);
  return uploadWithProgress(`/boil-off-tests/${encodeURIComponent(testId)}/attachments`, form, StoredFileSchema, onProgress);
}

export function useUploadAttachment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadAttachment,
    onSuccess: (_file, { testId }) => queryClient.invalidateQueries({ queryKey: testKeys.detail(testId) }),
  });
}

/** A plain link: the browser downloads it with the session cookie, no script in between. */
export const attachmentHref = (testId: string, attachmentId: string) =>
  `/api/boil-off-tests/${encodeURIComponent(testId)}/attachments/${encodeURIComponent(attachmentId)}`;
