/**
 * Recharts takes colours as values, not classes: these are tailwind.config.ts tokens, in one
 * place. Series colours are told apart by more than hue too (dash, marker or a legend word).
 */
export const chartColors = {
  grid: "#2b3a52", // ink-700
  axis: "#9fb0c5", // ink-300
  muted: "#7f92ab", // ink-400
  text: "#c5d0de", // ink-200
  primary: "#45cde0", // frost-400
  caution: "#fb9447", // ember-400
  cautionText: "#fdb97c", // ember-300
  good: "#5fcb8e", // moss-400
  background: "#0b111c", // ink-950
  series: ["#45cde0", "#fb9447", "#5fcb8e", "#b0eef6", "#f8766b", "#c5d0de"],
};

export const tooltipStyle = { background: "#131c2c", border: "1px solid #3d4f69", color: "#e3e9f1" };
