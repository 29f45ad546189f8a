import { memo } from "react";
import type { AssemblyResult } from "../../../../../shared/thermal/assembly";
import { fromSi, toSi, unitLabel, type UnitSystem } from "../../../../../shared/units";
import { formatNumber, formatQuantity } from "../../../../lib/format-quantity";
import { useUnitSystem } from "../../../../lib/unit-system";

const W = 640;
const H = 250;
const PAD = { left: 58, right: 14, top: 30, bottom: 44 };
const PLOT_W = W - PAD.left - PAD.right;
const PLOT_H = H - PAD.top - PAD.bottom;

/** Round tick values in the shown unit, placed by their temperature in K. */
function temperatureTicks(max_K: number, system: UnitSystem) {
  const lo = fromSi("temperature", 0, system);
  const hi = fromSi("temperature", max_K, system);
  const raw = (hi - lo) / 4;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? raw;
  const ticks: { label: string; K: number }[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + 1e-9; v += step) ticks.push({ label: formatNumber(v), K: toSi("temperature", v, system) });
  return ticks;
}

/**
 * The blanket drawn from the warm wall (left) to the cold vessel (right): one thin line per
 * shield, stages heavier and labelled, each block shaded, and the temperature profile against
 * the scale on the left. Shields are evenly spaced, as the engine places them.
 */
function WallSectionView({ result, warm_K }: { result: AssemblyResult; warm_K: number }) {
  const system = useUnitSystem();
  const { shields, stages, blocks } = result;
  const cold = stages[stages.length - 1];
  const m = shields.length;
  const gap = PLOT_W / (m + 1);
  const x = (i: number) => PAD.left + (i + 1) * gap;
  const y = (K: number) => PAD.top + (1 - K / warm_K) * PLOT_H;
  const T = (K: number) => formatQuantity("temperature", K, system);
  const labelEvery = Math.max(1, Math.ceil(m / 7));

  // Consecutive layer shields of one layup item form a block's shaded band.
  const bands: { layupIndex: number; first: number; last: number }[] = [];
  shields.forEach((s, i) => {
    if (s.kind !== "layer") return;
    const band = bands.at(-1);
    if (band && band.layupIndex === s.layupIndex && band.last === i - 1) band.last = i;
    else bands.push({ layupIndex: s.layupIndex, first: i, last: i });
  });
  const profile = [
    [x(-1), y(warm_K)],
    ...shields.flatMap((s, i) => (s.temperature_K === null ? [] : [[x(i), y(s.temperature_K)]])),
    [x(m), y(cold.temperature_K)],
  ];
  const stageShields = shields.map((s, i) => ({ s, i })).filter(({ s }) => s.kind === "stage");
  const summary =
    `Wall section, warm to cold: warm wall at ${T(warm_K)}; ${m - stageShields.length} shields in ${blocks.length} block${blocks.length === 1 ? "" : "s"}` +
    stageShields.map(({ s }) => `; stage at ${T(s.temperature_K ?? 0)}`).join("") +
    `; cold vessel at ${T(cold.temperature_K)}.`;

  return (
    <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={summary} className="h-auto w-full" fontSize="10">
      <title>{summary}</title>
      {bands.map((b) => {
        const block = blocks.find((k) => k.layupIndex === b.layupIndex);
        return (
          <g key={`${b.layupIndex}-${b.first}`}>
            <rect x={x(b.first) - gap / 2} y={PAD.top} width={(b.last - b.first + 1) * gap} height={PLOT_H} className="fill-frost-900/50" />
            <text x={(x(b.first) + x(b.last)) / 2} y={PAD.top - 8} textAnchor="middle" className="fill-ink-200">
              {block ? `${block.label}: ${block.layers} layers` : "block"}
            </text>
          </g>
        );
      })}
      {temperatureTicks(warm_K, system).map((t) => (
        <g key={t.label}>
          <line x1={PAD.left - 4} x2={PAD.left + PLOT_W} y1={y(t.K)} y2={y(t.K)} className="stroke-ink-800" strokeWidth={0.5} />
          <text x={PAD.left - 7} y={y(t.K) + 3} textAnchor="end" className="fill-ink-300">
            {t.label}
          </text>
        </g>
      ))}
      <text x={12} y={PAD.top + PLOT_H / 2} transform={`rotate(-90 12 ${PAD.top + PLOT_H / 2})`} textAnchor="middle" className="fill-ink-300">
        Temperature ({unitLabel("temperature", system)})
      </text>
      {shields.map((s, i) =>
        s.kind === "layer" ? (
          <line key={i} x1={x(i)} x2={x(i)} y1={PAD.top} y2={PAD.top + PLOT_H} className="stroke-ink-400" strokeWidth={m > 200 ? 0.4 : 0.8} strokeDasharray={s.temperature_K === null ? "3 3" : undefined} />
        ) : null,
      )}
      {stageShields.map(({ s, i }) => (
        <g key={`stage-${i}`}>
          <line x1={x(i)} x2={x(i)} y1={PAD.top} y2={PAD.top + PLOT_H} className="stroke-frost-300" strokeWidth={3} />
          <text x={x(i)} y={H - 20} textAnchor="middle" className="fill-frost-200 font-semibold">
            {stages.find((st) => st.layupIndex === s.layupIndex)?.label ?? "stage"} · {T(s.temperature_K ?? 0)}
          </text>
        </g>
      ))}
      <line x1={x(-1)} x2={x(-1)} y1={PAD.top} y2={PAD.top + PLOT_H} className="stroke-ember-300" strokeWidth={4} />
      <line x1={x(m)} x2={x(m)} y1={PAD.top} y2={PAD.top + PLOT_H} className="stroke-frost-200" strokeWidth={4} />
      <text x={x(-1)} y={H - 6} textAnchor="start" className="fill-ink-200">Warm wall · {T(warm_K)}</text>
      <text x={x(m)} y={H - 6} textAnchor="end" className="fill-ink-200">Cold vessel · {T(cold.temperature_K)}</text>
      <polyline points={profile.map((p) => p.join(",")).join(" ")} fill="none" className="stroke-ember-300" strokeWidth={1.5} />
      {shields.map((s, i) =>
        s.kind === "layer" && s.temperature_K !== null && i % labelEvery === labelEvery - 1 ? (
          <g key={`t-${i}`}>
            <circle cx={x(i)} cy={y(s.temperature_K)} r={2.5} className="fill-ember-200" />
            <text x={x(i) + 4} y={y(s.temperature_K) - 5} className="fill-ink-100">
              {formatNumber(fromSi("temperature", s.temperature_K, system))}
            </text>
          </g>
        ) : null,
      )}
    </svg>
  );
}

// Memoized: a keystroke re-renders the page, not this part, until a new answer changes its props.
export const WallSection = memo(WallSectionView);
