import type { z } from "zod";
import { ErrorBodySchema } from "../../../../shared/schemas/common";
import { ApiError } from "../../../lib/api-client";

export type UploadProgress = { loaded: number; total: number };

/**
 * A multipart POST to /api with upload progress. fetch() reports no upload progress, so this one
 * request type goes through XMLHttpRequest; it answers like apiRequest (the shared schema checks
 * the body, any status that is not OK throws ApiError with the server's field issues).
 */
export function uploadWithProgress<S extends z.ZodType>(
  path: string,
  form: FormData,
  schema: S,
  onProgress?: (progress: UploadProgress) => void,
  signal?: AbortSignal,
): Promise<z.output<S>> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api${path}`);
    xhr.responseType = "text";
    xhr.setRequestHeader("Accept", "application/json");
    xhr.withCredentials = true;
    if (onProgress) xhr.upload.onprogress = (e) => onProgress({ loaded: e.loaded, total: e.lengthComputable ? e.total : 0 });
    xhr.onerror = () => reject(new ApiError({ code: "network", message: "Frostfold's server could not be reached. Check the connection and try again.", status: 0 }));
    xhr.onabort = () => reject(new DOMException("The upload was cancelled", "AbortError"));
    xhr.onload = () => {
      let body: unknown;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : null;
      } catch {
        body = null; // a proxy's HTML page: reported below as the bare status
      }
      if (xhr.status < 200 || xhr.status >= 300) {
        const parsed = ErrorBodySchema.safeParse(body);
        reject(
          parsed.success
            ? new ApiError({ ...parsed.data.error, status: xhr.status })
            : new ApiError({ code: `http_${xhr.status}`, message: `The server answered ${xhr.status} ${xhr.statusText}`.trim(), status: xhr.status }),
        );
        return;
      }
      const result = schema.safeParse(body);
      if (result.success) resolve(result.data);
      else reject(new ApiError({ code: "bad_response", message: `Unexpected answer from POST /api${path}`, status: xhr.status }));
    };
    signal?.addEventListener("abort", () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}
