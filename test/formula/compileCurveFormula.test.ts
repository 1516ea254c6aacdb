/**
 * compileCurveFormula: user formulas over curve mnemonics (mathjs syntax). The reference
 * values come from mathjs itself and from the published Horsrud (2001) correlation.
 */
import { describe, expect, it } from "vitest";
import { evaluate } from "mathjs";
import { compileCurveFormula } from "../../src/formula/compileCurveFormula.js";
import { ucsFromSlownessHorsrud2001 } from "../../src/stress/ucsCorrelations.js";
import { errorOf as errOf } from "../helpers/shalepointErrors.js";

describe("compileCurveFormula", () => {
  it("Horsrud 2001 written as a user formula matches the built-in correlation and mathjs (from memory)", () => {
    const dt = Object.freeze([80, 100, 140]);
    const f = compileCurveFormula({ expression: "0.77 * (304.8 / DT) ^ 2.93 * MPA_TO_PSI", availableNames: ["DT", "RHOB"], constants: { MPA_TO_PSI: evaluate("1 MPa").toNumber("psi") } });
    expect(f.curveNames).toEqual(["DT"]);
    const r = f.evaluate({ curves: { DT: dt } });
    const builtIn = ucsFromSlownessHorsrud2001(dt);
    for (let i = 0; i < 3; i++) expect(Math.abs(r.values[i] / builtIn[i] - 1)).toBeLessThan(1e-8);
    expect(r.n).toBe(3);
  });
  it("evaluates sample by sample like mathjs on scalars; NaN input → NaN, not flagged", () => {
    const f = compileCurveFormula({ expression: "sqrt(RHOB) * log10(RES) + (DT > 100 ? 1 : 0) + pi", availableNames: ["DT", "RHOB", "RES"] });
    const curves = { DT: [90, 120, NaN], RHOB: [2.3, 2.1, 2.2], RES: [1.5, 0.8, 1] };
    const r = f.evaluate({ curves });
    expect(r.values[0]).toBeCloseTo(evaluate("sqrt(2.3) * log10(1.5) + 0 + pi"), 14);
    expect(r.values[1]).toBeCloseTo(evaluate("sqrt(2.1) * log10(0.8) + 1 + pi"), 14);
    expect(r.values[2]).toBeNaN();
    expect(r.missingInputCount).toBe(1);
    expect(r.nonFiniteIndices).toEqual([]);
    expect(curves.DT).toEqual([90, 120, NaN]);
  });
  it("unknown name → E_FORMULA_UNKNOWN_NAME naming the symbol and the available names", () => {
    const e = errOf(() => compileCurveFormula({ expression: "2 * DTC + 1", availableNames: ["DT", "RHOB"] }));
    expect(e.code).toBe("E_FORMULA_UNKNOWN_NAME");
    expect(e.details.value).toBe("DTC");
    expect(e.message).toContain("DT, RHOB");
  });
  it("refuses assignment and function definition", () => {
    expect(errOf(() => compileCurveFormula({ expression: "x = DT * 2", availableNames: ["DT"] })).code).toBe("E_FORMULA_UNSUPPORTED");
    expect(errOf(() => compileCurveFormula({ expression: "f(x) = x ^ 2", availableNames: ["DT"] })).code).toBe("E_FORMULA_UNSUPPORTED");
  });
  it("refuses functions outside the list, strings, matrices and units", () => {
    for (const expression of ['evaluate("1+1")', "import({}, {})", '"abc"', "[1, 2]", "DT * 5 ft", "DT to ft"]) {
      const code = errOf(() => compileCurveFormula({ expression, availableNames: ["DT"] })).code;
      expect(["E_FORMULA_UNSUPPORTED", "E_FORMULA_UNKNOWN_NAME"]).toContain(code);
    }
  });
  it("syntax error → E_FORMULA_SYNTAX with the column", () => {
    const e = errOf(() => compileCurveFormula({ expression: "DT +", availableNames: ["DT"] }));
    expect(e.code).toBe("E_FORMULA_SYNTAX");
    expect(e.details.column).toBe("5"); // mathjs reports the 1-based position just past the 4-character text
  });
  it("non-finite result: error names the sample; flag policy returns NaN and the index", () => {
    const f = compileCurveFormula({ expression: "1 / (DT - 100) + log(RHOB - 2)", availableNames: ["DT", "RHOB"] });
    const curves = { DT: [90, 100, 110], RHOB: [2.5, 2.5, 1.9] };
    const e = errOf(() => f.evaluate({ curves }));
    expect(e.code).toBe("E_FORMULA_NON_FINITE");
    expect(e.details.row).toBe(1);
    const r = f.evaluate({ curves, nonFinite: "flag" });
    expect(r.values[0]).toBeCloseTo(-0.1 + Math.log(0.5), 14);
    expect(r.nonFiniteIndices).toEqual([1, 2]); // 1/0 and log of a negative (NaN, predictable mode)
    expect(r.values[1]).toBeNaN();
  });
  it("missing curve or unequal lengths at evaluation → typed errors", () => {
    const f = compileCurveFormula({ expression: "DT * RHOB", availableNames: ["DT", "RHOB"] });
    expect(errOf(() => f.evaluate({ curves: { DT: [1] } })).code).toBe("E_FORMULA_MISSING_CURVE");
    expect(errOf(() => f.evaluate({ curves: { DT: [1], RHOB: [1, 2] } })).code).toBe("E_LENGTH");
  });
  it("doc example: 2 * DT + k over [100, NaN] → [201, NaN]", () => {
    const r = compileCurveFormula({ expression: "2 * DT + k", availableNames: ["DT"], constants: { k: 1 } }).evaluate({ curves: { DT: [100, NaN] } });
    expect(r.values[0]).toBe(201);
    expect(r.values[1]).toBeNaN();
  });
});
