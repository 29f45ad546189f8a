import { z } from "zod";
import { IdSchema } from "./common";

/**
 * An alert: an accepted boil-off test whose measured heat leak exceeds its prediction by more
 * than the organization's threshold (measured over predicted). It stays open on Overview until
 * someone acknowledges it.
 */
export const ALERT_THRESHOLD_RANGE = { min: 1, max: 10 } as const;
export const DEFAULT_ALERT_THRESHOLD = 1.25;

export const AlertSettingsSchema = z.object({
  /** Measured over predicted heat leak above which an accepted test raises an alert. */
  threshold: z
    .number({ error: `threshold must be a number from ${ALERT_THRESHOLD_RANGE.min} to ${ALERT_THRESHOLD_RANGE.max} (measured over predicted)` })
    .min(ALERT_THRESHOLD_RANGE.min, `threshold must be from ${ALERT_THRESHOLD_RANGE.min} to ${ALERT_THRESHOLD_RANGE.max} (measured over predicted)`)
    .max(ALERT_THRESHOLD_RANGE.max, `threshold must be from ${ALERT_THRESHOLD_RANGE.min} to ${ALERT_THRESHOLD_RANGE.max} (measured over predicted)`),
});
export type AlertSettings = z.infer<typeof AlertSettingsSchema>;

export const AlertParamsSchema = z.object({ id: IdSchema });

export const AlertSchema = z.object({
  id: IdSchema,
  testId: IdSchema,
  designId: IdSchema,
  designName: z.string(),
  revision: z.number().int(),
  vesselLabel: z.string(),
  ratio: z.number(),
  threshold: z.number(),
  measuredHeatLeak_W: z.number(),
  predictedHeatLeak_W: z.number(),
  message: z.string(),
  createdAt: z.string(),
  acknowledgedAt: z.string().nullable(),
  acknowledgedBy: z.string().nullable(),
});
export type Alert = z.infer<typeof AlertSchema>;
