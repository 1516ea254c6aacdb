/**
 * Number formatting of the HTML report: one rule for every table, and the raw value kept in
 * a `data-value` attribute so a reader (or a test) can recover the exact computed number.
 */
import { escapeHtml } from "../escapeHtml.js";

/** Text shown for a missing (NaN / non-finite) value. */
export const REPORT_MISSING_TEXT = "–";

/**
 * Format a number with a fixed count of decimals and comma thousands separators
 * (`12345.678`, 1 → `12,345.7`). Rounding is JavaScript's `toFixed` (round half away from
 * zero on the binary value). Non-finite values give {@link REPORT_MISSING_TEXT}. Independent of
 * the machine's locale, so reports are byte-identical everywhere.
 *
 * @param value any number, e.g. 6234.2857
 * @param decimals decimals shown, integer 0–10 (typical 0 for psi and ft, 2 for ppg)
 * @returns the formatted text
 * @example formatReportNumber(12345.678, 1) // "12,345.7"
 * @example formatReportNumber(-0.004, 2) // "0.00" (no negative zero)
 */
export function formatReportNumber(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return REPORT_MISSING_TEXT;
  const d = Math.min(10, Math.max(0, Math.floor(decimals)));
  let text = Math.abs(value).toFixed(d);
  const negative = value < 0 && Number(text) !== 0;
  const dot = text.indexOf(".");
  const whole = dot < 0 ? text : text.slice(0, dot);
  const fraction = dot < 0 ? "" : text.slice(dot);
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  text = grouped + fraction;
  return negative ? `-${text}` : text;
}

/**
 * Raw value for a `data-value` attribute: the shortest text that reads back to the same
 * double (`String(value)`, ECMA-262 Number::toString), so `Number(attr) === value` exactly;
 * `NaN` for a non-finite value.
 *
 * @param value any number
 * @returns e.g. `"6234.285714285715"`
 * @example rawNumberText(0.1 + 0.2) // "0.30000000000000004"
 */
export function rawNumberText(value: number): string {
  return Number.isFinite(value) ? String(value) : "NaN";
}

/**
 * A numeric table cell: `<td class="num" data-value="raw">formatted</td>`.
 *
 * @param value the computed number (shown rounded, kept raw in `data-value`)
 * @param decimals decimals shown (see {@link formatReportNumber})
 * @param key optional `data-key` naming the quantity, e.g. `predictedPsi` (escaped)
 * @returns the HTML of one cell
 * @example reportNumberCell(6234.2857, 0) // '<td class="num" data-value="6234.2857">6,234</td>'
 */
export function reportNumberCell(value: number, decimals: number, key?: string): string {
  const keyAttr = key === undefined ? "" : ` data-key="${escapeHtml(key)}"`;
  return `<td class="num"${keyAttr} data-value="${rawNumberText(value)}">${formatReportNumber(value, decimals)}</td>`;
}

/**
 * A text table cell, escaped.
 * @param text any text from files or results, e.g. a well name
 * @returns `<td>escaped</td>`
 * @example reportTextCell("<b>") // "<td>&lt;b&gt;</td>"
 */
export function reportTextCell(text: unknown): string {
  return `<td>${escapeHtml(text)}</td>`;
}
