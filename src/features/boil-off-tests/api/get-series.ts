import { queryOptions, useQuery } from "@tanstack/react-query";
import { SeriesSchema } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const getSeries = (testId: string, signal?: AbortSignal) =>
  apiRequest("GET", `/boil-off-tests/${encodeURIComponent(testId)}/series`, { schema: SeriesSchema, signal });

// The server downsamples when the log or the window changes; until then the chart is the same.
export const seriesQueryOptions = (testId: string) =>
  queryOptions({ queryKey: testKeys.series(testId), queryFn: ({ signal }) => getSeries(testId, signal), staleTime: 60_000 });

/** Only asked for once the test has a log (before that the server answers 409 no_log). */
export const useSeries = (testId: string, hasLog: boolean) => useQuery({ ...seriesQueryOptions(testId), enabled: hasLog });
