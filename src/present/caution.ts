/**
 * The safety caution every user-facing shalepoint output carries (notebooks, reports).
 */
import { escapeHtml } from "./escapeHtml.js";

/** The caution as plain text. */
export const SAFETY_CAUTION_TEXT =
  "Caution: shalepoint's results are estimates for trained engineers. A wrong pore-pressure " +
  "or fracture-gradient estimate can lead to a well-control incident or lost returns. Calibrate " +
  "every prediction to measured data (pressure tests, kicks, leak-off tests) and have it " +
  "reviewed by a qualified engineer before use; local regulations and licensed engineering " +
  "practice govern.";

/**
 * The caution as an HTML block for notebook output or a report page (bordered box,
 * Okabe–Ito vermillion edge).
 * @returns an HTML string (text escaped)
 * @example safetyCautionHtml().startsWith("<div") // true
 */
export function safetyCautionHtml(): string {
  return (
    '<div role="note" style="border-left:6px solid #D55E00;padding:8px 12px;margin:8px 0;' +
    'background:#FFFFFF;color:#000000;font-family:sans-serif">' +
    `<strong>${escapeHtml(SAFETY_CAUTION_TEXT.slice(0, 8))}</strong>${escapeHtml(SAFETY_CAUTION_TEXT.slice(8))}</div>`
  );
}
