import { queryOptions, useQuery } from "@tanstack/react-query";
import { TestDetailSchema } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const getTest = (testId: string, signal?: AbortSignal) =>
  apiRequest("GET", `/boil-off-tests/${encodeURIComponent(testId)}`, { schema: TestDetailSchema, signal });

export const testQueryOptions = (testId: string) =>
  queryOptions({ queryKey: testKeys.detail(testId), queryFn: ({ signal }) => getTest(testId, signal), staleTime: 0 });

export const useTest = (testId: string) => useQuery(testQueryOptions(testId));
