import type { TestStatus } from "../../../../shared/schemas/boil-off-test";
import { Badge } from "../../../components/ui/badge";
import { STATUS_LABELS } from "../utils/method-text";

const TONE = { logging: "neutral", analysed: "frost", accepted: "moss" } as const;

export function StatusBadge({ status }: { status: TestStatus }) {
  return <Badge tone={TONE[status]}>{STATUS_LABELS[status]}</Badge>;
}
