import { formatNumber } from "../../../lib/format-quantity";

/**
 * Measured over predicted. Above the organization's threshold it is marked in words and colour,
 * so the flag survives a grey screen.
 */
export function RatioText({ ratio, threshold }: { ratio: number | null; threshold?: number }) {
  if (ratio === null) return <>—</>;
  const over = threshold !== undefined && ratio > threshold;
  return (
    <span className={over ? "font-semibold text-ember-300" : undefined}>
      {formatNumber(ratio, 3)}×{over ? <span className="ml-1 text-xs font-normal">(over {formatNumber(threshold, 3)}×)</span> : null}
    </span>
  );
}
