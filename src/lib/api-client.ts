import type { z } from "zod";
import { ErrorBodySchema, type FieldIssue } from "../../shared/schemas/common";

/** The one error every request throws: the server's code, message and per-field issues. */
export class ApiError extends Error {
  readonly code: string;
  readonly status: number;
  readonly fields: FieldIssue[];
  readonly requestId?: string;

  constructor(init: { code: string; message: string; status: number; fields?: FieldIssue[]; requestId?: string }) {
    super(init.message);
    this.name = "ApiError";
    this.code = init.code;
    this.status = init.status;
    this.fields = init.fields ?? [];
    this.requestId = init.requestId;
  }
}

export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

type Method = "GET" | "POST" | "PUT" | "PATCH" | "DELETE";

async function toApiError(response: Response): Promise<ApiError> {
  const body: unknown = await response.json().catch(() => null);
  const parsed = ErrorBodySchema.safeParse(body);
  if (parsed.success) return new ApiError({ ...parsed.data.error, status: response.status });
  // A proxy or a crash can answer without our error body; still give the user something readable.
  return new ApiError({
    code: `http_${response.status}`,
    message: `The server answered ${response.status} ${response.statusText}`.trim(),
    status: response.status,
  });
}

/**
 * Calls /api and validates the answer with the shared schema, so a contract drift fails loudly
 * here instead of deep in a component. Throws ApiError on any status that is not OK.
 */
export async function apiRequest<S extends z.ZodType | undefined = undefined>(
  method: Method,
  path: string,
  options: { body?: unknown; schema?: S; signal?: AbortSignal } = {},
): Promise<S extends z.ZodType ? z.output<S> : void> {
  let response: Response;
  // A FormData body (a file upload) goes as multipart: the browser writes its own Content-Type.
  const isForm = options.body instanceof FormData;
  try {
    response = await fetch(`/api${path}`, {
      method,
      credentials: "same-origin",
      headers: options.body === undefined || isForm ? { Accept: "application/json" } : { Accept: "application/json", "Content-Type": "application/json" },
      body: options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError({ code: "network", message: "Frostfold's server could not be reached. Check the connection and try again.", status: 0 });
  }
  if (!response.ok) throw await toApiError(response);
  if (!options.schema) return undefined as never;
  const data: unknown = await response.json();
  const result = options.schema.safeParse(data);
  if (!result.success) {
    throw new ApiError({ code: "bad_response", message: `Unexpected answer from ${method} /api${path}`, status: response.status });
  }
  return result.data as never;
}
