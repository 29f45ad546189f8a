import { CautionsBox } from "../../../components/ui/cautions-box";

// PRODUCT.md's cautions that bear on a measured boil-off: what the figure can and cannot say,
// and the hazards of the measurement itself (vented gas, cold surfaces, trapped liquid).
const CAUTIONS = [
  "Estimates only: a measured heat leak carries the fit's uncertainty and the logger's own errors.",
  "Loss of vacuum multiplies the heat leak by orders of magnitude: a ratio far above 1 calls for a vacuum check before anything else.",
  "Vented cryogen displaces oxygen (asphyxiation): log vent flow where the gas is led away or the room is monitored.",
  "Trapped liquid builds pressure: every closed volume needs relief, including a blocked vent line during a test.",
  "Cold surfaces burn skin; liquid-nitrogen-cold surfaces condense oxygen-rich liquid from air.",
  "Local codes, the site's oxygen-deficiency procedure and licensed engineering practice govern.",
];

export function MeasuredCautions() {
  return <CautionsBox cautions={CAUTIONS} />;
}
