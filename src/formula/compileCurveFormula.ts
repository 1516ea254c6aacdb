/**
 * User formulas over log curves (edge module: uses mathjs).
 *
 * A local correlation (for example UCS from slowness and density fitted to the user's own
 * core tests) is written in mathjs expression syntax over curve mnemonics, compiled once and
 * evaluated sample by sample into a Float64Array.
 */
import { all, create, type MathNode } from "mathjs";
import { ShalepointError } from "../errors.js";

// predictable: sqrt(-1) and log(-1) give NaN instead of complex numbers.
const math = create(all, { predictable: true });

/** Functions a curve formula may call (elementary, side-effect free). */
export const CURVE_FORMULA_FUNCTIONS: readonly string[] = [
  "abs", "sqrt", "cbrt", "exp", "log", "log10", "log2", "pow", "min", "max",
  "sin", "cos", "tan", "asin", "acos", "atan", "atan2", "sinh", "cosh", "tanh",
  "floor", "ceil", "round", "sign", "square", "cube", "hypot",
];

/** Named constants a formula may use besides the caller's own. */
export const CURVE_FORMULA_CONSTANTS: Readonly<Record<string, number>> = { pi: Math.PI, e: Math.E };

const OPERATOR_FNS = new Set([
  "add", "subtract", "multiply", "divide", "pow", "unaryMinus", "unaryPlus", "mod",
  "larger", "smaller", "largerEq", "smallerEq", "equal", "unequal", "and", "or", "not",
  "dotMultiply", "dotDivide", "dotPow",
]);
const ALLOWED_NODES = new Set(["ConstantNode", "SymbolNode", "OperatorNode", "ParenthesisNode", "FunctionNode", "ConditionalNode"]);

/** What to do with a non-finite result at a sample whose inputs are all present. */
export type NonFinitePolicy = "error" | "flag";

/** Result of evaluating a compiled formula over curves. */
export interface CurveFormulaResult {
  /** One value per sample; NaN where an input is missing or a flagged result is non-finite. */
  values: Float64Array;
  /** Samples where every input was present. */
  n: number;
  /** Samples with a missing (NaN) input, returned as NaN without a flag. */
  missingInputCount: number;
  /** Samples (indices) whose inputs were present but whose result was not finite. */
  nonFiniteIndices: number[];
}

/** A formula compiled once, ready to run over curves. */
export interface CompiledCurveFormula {
  expression: string;
  /** Curve mnemonics the formula reads, in order of first use. */
  curveNames: string[];
  /**
   * Evaluate over curves (all the same length). Inputs are not mutated.
   * @throws ShalepointError E_FORMULA_MISSING_CURVE, E_LENGTH, E_FORMULA_NON_FINITE (policy "error")
   */
  evaluate(args: { curves: Readonly<Record<string, ArrayLike<number>>>; nonFinite?: NonFinitePolicy }): CurveFormulaResult;
}

/**
 * Compile a curve formula.
 *
 * Parses the expression with mathjs, refuses anything but numbers, names, operators,
 * parentheses, the conditional `a ? b : c` and calls to {@link CURVE_FORMULA_FUNCTIONS}
 * (no assignment, no function definition, no units, strings, matrices or property access),
 * and checks that every name is an available curve mnemonic or a constant.
 *
 * @param args.expression mathjs expression, e.g. `"0.77 * (304.8 / DT) ^ 2.93 * 145.0377"`
 * @param args.availableNames curve mnemonics the user may refer to, e.g. ["DT", "RHOB"]
 * @param args.constants extra named constants, e.g. { a: 0.77 }
 * @returns the compiled formula
 * @throws ShalepointError E_FORMULA_SYNTAX (column = the 1-based character position mathjs reports), E_FORMULA_UNSUPPORTED (the
 *   node kind or function), E_FORMULA_UNKNOWN_NAME (naming the symbol and the available names)
 * @example compileCurveFormula({ expression: "2 * DT + k", availableNames: ["DT"], constants: { k: 1 } })
 *   .evaluate({ curves: { DT: [100, NaN] } }).values // [201, NaN]
 *
 * Reference: mathjs expression syntax (https://mathjs.org/docs/expressions/syntax.html).
 */
export function compileCurveFormula(args: {
  expression: string;
  availableNames: readonly string[];
  constants?: Readonly<Record<string, number>>;
}): CompiledCurveFormula {
  const { expression, availableNames } = args;
  const constants: Record<string, number> = { ...CURVE_FORMULA_CONSTANTS, ...(args.constants ?? {}) };
  let root: MathNode;
  try {
    root = math.parse(expression);
  } catch (e) {
    const err = e as Error & { char?: number };
    throw new ShalepointError("E_FORMULA_SYNTAX", `formula does not parse: ${err.message}`, {
      param: "expression", value: expression, column: err.char !== undefined ? String(err.char) : undefined,
      hint: "Use mathjs syntax, e.g. 0.77 * (304.8 / DT) ^ 2.93",
    });
  }
  const available = new Set(availableNames);
  const curveNames: string[] = [];
  root.traverse((node, path, parent) => {
    if (!ALLOWED_NODES.has(node.type)) {
      throw new ShalepointError("E_FORMULA_UNSUPPORTED", `formula uses an unsupported construct (${node.type})`, {
        param: "expression", value: node.toString(),
        allowed: "numbers, curve names, constants, + - * / ^ %, comparisons, and/or/not, a ? b : c, calls to " + CURVE_FORMULA_FUNCTIONS.join(", "),
        hint: node.type.includes("Assignment") ? "Assignments and function definitions are not allowed: write one expression." : undefined,
      });
    }
    if (node.type === "ConstantNode" && typeof (node as unknown as { value: unknown }).value !== "number") {
      throw new ShalepointError("E_FORMULA_UNSUPPORTED", "formula constants must be numbers", { param: "expression", value: node.toString() });
    }
    if (node.type === "OperatorNode") {
      const fn = (node as unknown as { fn: string }).fn;
      if (!OPERATOR_FNS.has(fn)) {
        throw new ShalepointError("E_FORMULA_UNSUPPORTED", `formula uses an unsupported operator (${(node as unknown as { op: string }).op})`, { param: "expression", value: node.toString() });
      }
    }
    if (node.type === "FunctionNode") {
      const fn = (node as unknown as { fn: MathNode }).fn;
      const name = fn.type === "SymbolNode" ? (fn as unknown as { name: string }).name : undefined;
      if (name === undefined || !CURVE_FORMULA_FUNCTIONS.includes(name)) {
        throw new ShalepointError("E_FORMULA_UNSUPPORTED", `formula calls an unsupported function (${name ?? fn.toString()})`, {
          param: "expression", value: name ?? fn.toString(), allowed: CURVE_FORMULA_FUNCTIONS.join(", "),
        });
      }
    }
    if (node.type === "SymbolNode" && !(parent?.type === "FunctionNode" && path === "fn")) {
      const name = (node as unknown as { name: string }).name;
      if (available.has(name)) {
        if (!curveNames.includes(name)) curveNames.push(name);
      } else if (!Object.prototype.hasOwnProperty.call(constants, name)) {
        throw new ShalepointError("E_FORMULA_UNKNOWN_NAME", `formula refers to unknown name "${name}"`, {
          param: "expression", value: name,
          allowed: `curves ${[...available].join(", ") || "(none)"}; constants ${Object.keys(constants).join(", ")}`,
          hint: "Names are case-sensitive curve mnemonics.",
        });
      }
    }
  });
  const code = root.compile();

  return {
    expression,
    curveNames: [...curveNames],
    evaluate({ curves, nonFinite = "error" }) {
      let len = -1;
      for (const name of curveNames) {
        const c = Object.prototype.hasOwnProperty.call(curves, name) ? curves[name] : undefined;
        if (c === undefined) {
          throw new ShalepointError("E_FORMULA_MISSING_CURVE", `curve "${name}" used by the formula was not supplied`, {
            param: "curves", value: name, allowed: Object.keys(curves).join(", ") || "(none)",
          });
        }
        if (len < 0) len = c.length;
        else if (c.length !== len) {
          throw new ShalepointError("E_LENGTH", "formula curves must have the same length", {
            param: name, value: `${c.length} vs ${len}`, hint: "Put every curve on the same depth index first.",
          });
        }
      }
      if (len < 0) len = 1; // a formula of constants only: one value
      const values = new Float64Array(len);
      const nonFiniteIndices: number[] = [];
      let missingInputCount = 0;
      const scope = new Map<string, number>(Object.entries(constants));
      for (let i = 0; i < len; i++) {
        let missing = false;
        for (const name of curveNames) {
          const v = curves[name][i];
          if (Number.isNaN(v)) missing = true;
          scope.set(name, v);
        }
        if (missing) {
          values[i] = NaN;
          missingInputCount++;
          continue;
        }
        const r: unknown = code.evaluate(scope);
        const num = typeof r === "number" ? r : typeof r === "boolean" ? (r ? 1 : 0) : NaN;
        if (Number.isFinite(num)) {
          values[i] = num;
        } else if (nonFinite === "error") {
          const inputs = curveNames.map((nm) => `${nm}=${curves[nm][i]}`).join(", ");
          throw new ShalepointError("E_FORMULA_NON_FINITE", `formula gave a non-finite result at sample ${i} (${inputs})`, {
            param: "expression", value: expression, row: i,
            hint: 'Guard the formula (e.g. max(x, 1e-6)) or evaluate with nonFinite: "flag".',
          });
        } else {
          values[i] = NaN;
          nonFiniteIndices.push(i);
        }
      }
      return { values, n: len - missingInputCount, missingInputCount, nonFiniteIndices };
    },
  };
}
