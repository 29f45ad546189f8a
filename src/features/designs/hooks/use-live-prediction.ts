import { useEffect, useMemo, useRef, useState } from "react";
import { useWatch, type FieldPath, type UseFormReturn } from "react-hook-form";
import type { Prediction } from "../../../../shared/design/prediction";
import { DesignContentSchema, type DesignContent, type DesignContentInput } from "../../../../shared/schemas/design";
import { useDebouncedValue } from "../../../hooks/use-debounced-value";
import { isApiError } from "../../../lib/api-client";
import { useEstimate } from "../api/estimate-design";
import type { ResultsState } from "../components/results/results-panel";

// Long enough to merge the keystrokes of one number, short enough to leave the repaint budget (150 ms) to the estimate.
const DEBOUNCE_MS = 50;
const MAX_PROBLEMS = 6;

type Saved = { contentKey: string | null; prediction: Prediction };

export const contentKeyOf = (values: unknown): string | null => {
  const parsed = DesignContentSchema.safeParse(values);
  return parsed.success ? JSON.stringify(parsed.data) : null;
};

/**
 * Every valid edit → POST /api/estimate (debounced), keyed by the content, twice: the figures
 * without the layer-count sweep (quick, repainted first) and the whole prediction with it. The
 * previous sweep stays, marked as updating, until its own answer lands. The saved revision's
 * prediction stands in while the form still holds exactly that content, so opening a design
 * costs no estimate. The last good prediction stays while the form is invalid or refused.
 */
export function useLivePrediction(form: UseFormReturn<DesignContentInput, unknown, DesignContent>, saved?: Saved) {
  const values = useWatch({ control: form.control });
  const parsed = DesignContentSchema.safeParse(values);
  const validKey = parsed.success ? JSON.stringify(parsed.data) : null;
  const settledKey = useDebouncedValue(validKey, DEBOUNCE_MS);
  const usesSaved = settledKey !== null && settledKey === saved?.contentKey;
  const figures = useEstimate(usesSaved ? null : settledKey, false);
  const full = useEstimate(usesSaved ? null : settledKey, true);

  const [lastGood, setLastGood] = useState<Prediction | null>(saved?.prediction ?? null);
  const fullNow = full.data && !full.isPlaceholderData ? full.data.prediction : undefined;
  const figuresNow = figures.data && !figures.isPlaceholderData ? figures.data.prediction : undefined;
  const lastSweep = lastGood?.sweep ?? null;
  // Memoized so the merged prediction is one object per answer (it is compared with lastGood below).
  const figuresWithLastSweep = useMemo(() => (figuresNow ? { ...figuresNow, sweep: lastSweep } : undefined), [figuresNow, lastSweep]);
  const current = usesSaved ? saved.prediction : (fullNow ?? figuresWithLastSweep);
  if (current && current !== lastGood) setLastGood(current);
  const sweepUpdating = !usesSaved && settledKey !== null && fullNow === undefined && !full.isError;

  // The server's field issues go beside the fields; they are cleared once an estimate succeeds.
  const { setError, clearErrors } = form;
  const marked = useRef<string[]>([]);
  useEffect(() => {
    const error = figures.error;
    if (!isApiError(error) || error.fields.length === 0) return;
    for (const issue of error.fields) setError(issue.path as FieldPath<DesignContentInput>, { type: "server", message: issue.message });
    marked.current = error.fields.map((f) => f.path);
  }, [figures.error, setError]);
  useEffect(() => {
    if (!figures.isSuccess || figures.isPlaceholderData || marked.current.length === 0) return;
    clearErrors(marked.current as FieldPath<DesignContentInput>[]);
    marked.current = [];
  }, [figures.isSuccess, figures.isPlaceholderData, clearErrors]);

  let state: ResultsState = "fresh";
  let problems: string[] = [];
  if (!parsed.success) {
    state = "stale";
    problems = parsed.error.issues.slice(0, MAX_PROBLEMS).map((i) => i.message);
  } else if (figures.error && !usesSaved && !figures.isFetching) {
    state = "stale";
    problems = isApiError(figures.error) && figures.error.fields.length > 0 ? figures.error.fields.map((f) => f.message) : [figures.error.message];
  } else if (validKey !== settledKey || figures.isFetching) {
    state = "updating";
  }
  return { prediction: current ?? lastGood, state, problems, sweepUpdating: state !== "stale" && sweepUpdating };
}
