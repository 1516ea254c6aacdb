import type { Well } from "../../src/well/types.js";

/**
 * The first n samples of a well (every curve and the depth arrays sliced), as a while-drilling
 * test's starting state: the well drilled to sample n.
 */
export function wellHead(well: Well, n: number): Well {
  const curves: Well["curves"] = {};
  for (const [k, c] of Object.entries(well.curves)) curves[k] = { ...c, values: c.values.slice(0, n) };
  return { ...well, mdFt: well.mdFt.slice(0, n), tvdFt: well.tvdFt.slice(0, n), curves };
}
