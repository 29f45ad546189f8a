import type { ErrorRequestHandler } from "express";
import type { ErrorBody } from "../../shared/schemas/common";
import { ThermalInputError } from "../../shared/thermal/errors";
import { AppError } from "../errors";

/** The one place that turns errors into responses: a code, a message, and fields when known. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const requestId = String(req.id ?? "");
  const send = (status: number, error: ErrorBody["error"]) => res.status(status).json({ error });

  if (error instanceof AppError) {
    return send(error.status, { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}) });
  }
  if (error instanceof ThermalInputError) {
    // The engine names fields as layup[2].temperature_K; forms and zod use layup.2.temperature_K.
    const path = error.field.replace(/\[(\d+)\]/g, ".$1");
    return send(400, { code: "invalid_input", message: error.message, fields: [{ path, message: error.message }] });
  }
  // body-parser's own errors carry an HTTP status and a type.
  const status = (error as { status?: number }).status;
  const type = (error as { type?: string }).type;
  if (type === "entity.parse.failed") return send(400, { code: "invalid_json", message: "The request body is not valid JSON." });
  if (type === "entity.too.large" || status === 413) return send(413, { code: "too_large", message: "The request body is too large." });
  if (error?.code === "LIMIT_FILE_SIZE") return send(413, { code: "too_large", message: "The file is larger than the upload limit." });

  req.log?.error({ err: error, reqId: requestId }, "unhandled error");
  return send(500, { code: "internal", message: `Something went wrong on our side. Quote request id ${requestId} if you report it.`, requestId });
};
