import type { CompareResult } from "../../../../shared/schemas/design";

/** Every sink label across the compared designs, warm → cold in order of first appearance. */
export function stageLabels(result: CompareResult): string[] {
  const labels: string[] = [];
  for (const item of result.items) for (const s of item.stages) if (!labels.includes(s.label)) labels.push(s.label);
  // The cold vessel is every design's last sink: keep it last in the union too.
  const cold = result.items[0]?.stages.at(-1)?.label;
  return cold ? [...labels.filter((l) => l !== cold), cold] : labels;
}
