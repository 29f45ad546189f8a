import { useMutation, useQueryClient } from "@tanstack/react-query";
import { TestDetailSchema, type LogUploadFields } from "../../../../shared/schemas/boil-off-test";
import { testKeys } from "./test-keys";
import { uploadWithProgress, type UploadProgress } from "./upload-with-progress";

type UploadLogInput = { testId: string; file: File; fields: LogUploadFields; onProgress?: (p: UploadProgress) => void };

/** The whole file with its column mapping; the server stores it only if every line is valid. */
export function uploadLog({ testId, file, fields, onProgress }: UploadLogInput) {
  const form = new FormData();
  // Fields before the file, so the server could read them first if it ever streams the file.
  for (const [name, value] of Object.entries(fields)) if (value !== undefined && value !== "") form.append(name, String(value));
  form.append("file", file);
  return uploadWithProgress(`/boil-off-tests/${encodeURIComponent(testId)}/logs`, form, TestDetailSchema, onProgress);
}

export function useUploadLog() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadLog,
    onSuccess: (test) => {
      queryClient.setQueryData(testKeys.detail(test.id), test);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: testKeys.series(test.id) }),
        queryClient.invalidateQueries({ queryKey: testKeys.lists() }),
      ]);
    },
  });
}
