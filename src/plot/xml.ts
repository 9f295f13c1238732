/**
 * Text escaping shared by the SVG and HTML builders. Pure functions, no DOM.
 *
 * @module
 */

/**
 * Escape text for XML/HTML character data and attribute values: `&`, `<`,
 * `>`, `"` and `'` become entities, and characters not allowed in XML 1.0
 * (C0 controls other than tab, LF, CR; lone surrogates; U+FFFE/U+FFFF) are
 * replaced by U+FFFD so the document stays well-formed.
 *
 * Source: W3C, Extensible Markup Language (XML) 1.0 (Fifth Edition), §2.2
 * (Char production) and §2.4 (character data).
 *
 * @example
 * ```ts
 * import { escapeXml } from "starlume";
 * escapeXml('H<sub>α</sub> & "Hβ"'); // "H&lt;sub&gt;α&lt;/sub&gt; &amp; &quot;Hβ&quot;"
 * ```
 */
export function escapeXml(text: string): string {
  return text
    .replace(/[&<>"']/g, (c) => ENTITY[c] ?? c)
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g, "\uFFFD");
}

const ENTITY: Readonly<Record<string, string>> = {
  "&": "&amp;",
  "<": "&lt;",
  ">": "&gt;",
  '"': "&quot;",
  "'": "&#39;",
};

/**
 * Format a pixel coordinate with at most 2 decimals and no `-0`, for compact
 * SVG output. Callers guarantee finiteness. Internal to the plot module.
 *
 * @internal
 * @example
 * ```text
 * px(12.3456); // "12.35"
 * px(-0.001);  // "0"
 * ```
 */
export function px(v: number): string {
  const r = Math.round(v * 100) / 100;
  return r === 0 ? "0" : String(r);
}
