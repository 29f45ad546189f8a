import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { TestSummarySchema } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

const TestListSchema = z.object({ tests: z.array(TestSummarySchema) });

export const getTests = (designId?: string, signal?: AbortSignal) =>
  apiRequest("GET", `/boil-off-tests${designId ? `?designId=${encodeURIComponent(designId)}` : ""}`, { schema: TestListSchema, signal });

// Stale at once: technicians upload from other browsers and each visit should see the new ratios.
export const testsQueryOptions = (designId?: string) =>
  queryOptions({ queryKey: testKeys.list(designId), queryFn: ({ signal }) => getTests(designId, signal), staleTime: 0 });

export const useTests = (designId?: string) => useQuery(testsQueryOptions(designId));
