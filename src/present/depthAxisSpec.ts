/**
 * The depth axis shared by shalepoint's depth plots.
 */
import type { AxisSpec } from "./figureSpec.js";
import { escapePlotlyText } from "./escapeHtml.js";

/** How a plotted depth is measured (see well/types.ts for the definitions). */
export type DepthReferenceLabel = "MD" | "TVD" | "TVDSS" | "BML";

/** Axis-title wording of each depth reference. */
export const DEPTH_REFERENCE_TITLES: Readonly<Record<DepthReferenceLabel, string>> = {
  MD: "Measured depth, MD",
  TVD: "True vertical depth below RT, TVD",
  TVDSS: "True vertical depth below sea level, TVDSS",
  BML: "Depth below mudline",
};

/**
 * Depth-axis specification: titled with reference and unit, increasing downward.
 *
 * @param reference which depth is plotted, e.g. `"TVD"`
 * @param unit display unit, `"ft"` (internal) or `"m"`
 * @param title optional replacement for the reference wording (escaped here); the unit is appended
 * @returns a y-axis spec with `autorange: "reversed"`
 * @example depthAxisSpec({ reference: "MD", unit: "ft" }).title.text // "Measured depth, MD (ft)"
 */
export function depthAxisSpec({
  reference,
  unit,
  title,
}: {
  reference: DepthReferenceLabel;
  unit: "ft" | "m";
  title?: string;
}): AxisSpec {
  const words = title === undefined ? DEPTH_REFERENCE_TITLES[reference] : escapePlotlyText(title);
  return {
    title: { text: `${words} (${unit})` },
    autorange: "reversed",
    type: "linear",
    showgrid: true,
    zeroline: false,
    ticks: "outside",
    tickformat: ",.0f",
  };
}
