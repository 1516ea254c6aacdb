/**
 * HTML escaping for text that came from files or users (well names, curve descriptions,
 * header values) before it is placed in notebook output, tables or reports.
 */

const HTML_ENTITIES: Readonly<Record<string, string>> = {
  "&": "&amp;",
  "<": "&lt;",
  ">": "&gt;",
  '"': "&quot;",
  "'": "&#39;",
};

/**
 * Escape text for HTML element content and for quoted attribute values: replaces the five
 * characters `& < > " '` with character references (HTML Living Standard, §13.1.4
 * "Character references"; `&#39;` for the apostrophe works in HTML 4 and XML too).
 * Any other character passes through unchanged. Non-string input is converted with
 * `String(value)` first; `null`/`undefined` give an empty string.
 *
 * @param text text to escape; any string, e.g. a well name `Quillon A-1 "ST"`
 * @returns the escaped string, safe between tags and inside `"..."` or `'...'` attributes
 * @example escapeHtml('<b>A&B</b>') // "&lt;b&gt;A&amp;B&lt;/b&gt;"
 */
export function escapeHtml(text: unknown): string {
  if (text === null || text === undefined) return "";
  return String(text).replace(/[&<>"']/g, (c) => HTML_ENTITIES[c]);
}

/**
 * Serialise a value as JSON that is safe to embed inside an HTML `<script>` element:
 * `<`, `>`, `&` and every non-ASCII character (including U+2028 and U+2029) are written as
 * `\uXXXX` escapes, so the text can never close the script element (`</script>`) or open a
 * comment (`<!--`), reads the same whatever the page's declared character set (µ, ·, −
 * survive), and stays valid JavaScript (ECMA-404 JSON allows `\u` escapes in strings; these
 * characters can only occur inside strings). NaN and ±Infinity become `null`, as
 * JSON.stringify does.
 *
 * @param value any JSON-serialisable value (typed arrays are written as objects: convert to arrays first)
 * @returns ASCII-only JSON text with no raw `<`, `>` or `&`
 * @example jsonForScript({ name: "</script>" }) // '{"name":"\\u003c/script\\u003e"}'
 */
export function jsonForScript(value: unknown): string {
  const json = JSON.stringify(value);
  if (json === undefined) return "null";
  return json.replace(/[<>&\u007f-\uffff]/g, (c) => "\\u" + c.charCodeAt(0).toString(16).padStart(4, "0"));
}

const PLOTLY_ENTITIES: Readonly<Record<string, string>> = {
  "&": "&amp;",
  "<": "&lt;",
  ">": "&gt;",
  '"': "&#34;",
  "'": "&#39;",
};

/**
 * Escape text for a plotly title, axis title or legend name. Plotly renders these strings
 * as a small subset of HTML, so markup from a file must be escaped; it decodes `&amp;`,
 * `&lt;`, `&gt;` and numeric references but shows `&quot;` literally, so quotes are written
 * as numeric references here (HTML Living Standard, §13.1.4 "Character references").
 *
 * @param text text to escape, e.g. a well name `Quillon "A-1"`
 * @returns the escaped string
 * @example escapePlotlyText('A "B" <i>') // "A &#34;B&#34; &lt;i&gt;"
 */
export function escapePlotlyText(text: unknown): string {
  if (text === null || text === undefined) return "";
  return String(text).replace(/[&<>"']/g, (c) => PLOTLY_ENTITIES[c]);
}
