import { useEffect, useRef, useState } from "react";
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
 * Every valid edit → POST /api/estimate (debounced), keyed by the content. The saved revision's
 * own prediction stands in while the form still holds exactly that content, so opening a design
 * costs no estimate. The last good prediction stays while the form is invalid or refused.
 */
export function useLivePrediction(form: UseFormReturn<DesignContentInput, unknown, DesignContent>, saved?: Saved) {
  const values = useWatch({ control: form.control });
  const parsed = DesignContentSchema.safeParse(values);
  const validKey = parsed.success ? JSON.stringify(parsed.data) : null;
  const settledKey = useDebouncedValue(validKey, DEBOUNCE_MS);
  const usesSaved = settledKey !== null && settledKey === saved?.contentKey;
  const estimate = useEstimate(usesSaved ? null : settledKey);

  const current = usesSaved ? saved.prediction : estimate.data && !estimate.isPlaceholderData ? estimate.data.prediction : undefined;
  const [lastGood, setLastGood] = useState<Prediction | null>(saved?.prediction ?? null);
  if (current && current !== lastGood) setLastGood(current);

  // The server's field issues go beside the fields; they are cleared once an estimate succeeds.
  const { setError, clearErrors } = form;
  const marked = useRef<string[]>([]);
  useEffect(() => {
    const error = estimate.error;
    if (!isApiError(error) || error.fields.length === 0) return;
    for (const issue of error.fields) setError(issue.path as FieldPath<DesignContentInput>, { type: "server", message: issue.message });
    marked.current = error.fields.map((f) => f.path);
  }, [estimate.error, setError]);
  useEffect(() => {
    if (!estimate.isSuccess || estimate.isPlaceholderData || marked.current.length === 0) return;
    clearErrors(marked.current as FieldPath<DesignContentInput>[]);
    marked.current = [];
  }, [estimate.isSuccess, estimate.isPlaceholderData, clearErrors]);

  let state: ResultsState = "fresh";
  let problems: string[] = [];
  if (!parsed.success) {
    state = "stale";
    problems = parsed.error.issues.slice(0, MAX_PROBLEMS).map((i) => i.message);
  } else if (estimate.error && !usesSaved && !estimate.isFetching) {
    state = "stale";
    problems = isApiError(estimate.error) && estimate.error.fields.length > 0 ? estimate.error.fields.map((f) => f.message) : [estimate.error.message];
  } else if (validKey !== settledKey || estimate.isFetching) {
    state = "updating";
  }
  return { prediction: current ?? lastGood, state, problems };
}
