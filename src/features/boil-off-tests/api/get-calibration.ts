import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { CalibrationSchema } from "../../../../shared/schemas/boil-off-test";
import { apiRequest } from "../../../lib/api-client";
import { testKeys } from "./test-keys";

export const calibrationQueryOptions = (designId: string) =>
  queryOptions({
    queryKey: testKeys.calibration(designId),
    queryFn: ({ signal }) => apiRequest("GET", `/designs/${encodeURIComponent(designId)}/calibration`, { schema: CalibrationSchema, signal }),
  });

export const useCalibration = (designId: string) => useQuery(calibrationQueryOptions(designId));

// Only the fields this screen shows; the rest of the new revision is the design page's business.
const AppliedSchema = z.object({
  revision: z.number().int(),
  calibration: z.object({ factor: z.number(), factorStdError: z.number(), tests: z.number().int(), clampedBlocks: z.array(z.number().int()) }),
});

/** Saves the calibrated degradation factor as a new revision of the design. */
export function useApplyCalibration() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ designId, baseRevision }: { designId: string; baseRevision: number }) =>
      apiRequest("POST", `/designs/${encodeURIComponent(designId)}/calibration/apply`, { body: { baseRevision }, schema: AppliedSchema }),
    onSuccess: (_r, { designId }) =>
      // ["designs"] is the designs feature's key prefix (not importable here): its lists and detail show the new revision.
      Promise.all([queryClient.invalidateQueries({ queryKey: testKeys.calibration(designId) }), queryClient.invalidateQueries({ queryKey: ["designs"] })]),
  });
}
