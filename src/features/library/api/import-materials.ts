import { useMutation, useQueryClient } from "@tanstack/react-query";
import { ImportPreviewSchema, ImportResultSchema } from "../../../../shared/schemas/material";
import { apiRequest } from "../../../lib/api-client";
import { libraryKeys } from "./library-keys";

const asUpload = (file: File) => {
  const form = new FormData();
  form.append("file", file);
  return form;
};

/** The dry run: every row with its line number and problems; nothing is written. */
export const previewImport = (file: File) =>
  apiRequest("POST", "/materials/import?dryRun=true", { body: asUpload(file), schema: ImportPreviewSchema });

/** The real import: all rows become drafts, or none do (the server refuses a file with any bad row). */
export const importMaterials = (file: File) =>
  apiRequest("POST", "/materials/import", { body: asUpload(file), schema: ImportResultSchema });

export const usePreviewImport = () => useMutation({ mutationFn: previewImport });

export function useImportMaterials() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importMaterials,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: libraryKeys.materials() }),
  });
}
