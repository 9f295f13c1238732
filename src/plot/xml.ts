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

// ---------------------------------------------------------------------------
// Sub- and superscript markup

/** One run of marked-up text: normal, subscript or superscript. */
interface Run {
  readonly text: string;
  readonly kind: "normal" | "sub" | "sup";
}

/**
 * Split text with `_{…}` (subscript) and `^{…}` (superscript) markup into
 * runs. Only the braced forms are markup: a lone `_` or `^`, or one without
 * a closing brace, is kept as a literal character. Braces do not nest.
 */
function markupRuns(text: string): Run[] {
  const runs: Run[] = [];
  let normal = "";
  let i = 0;
  while (i < text.length) {
    const c = text[i];
    if ((c === "_" || c === "^") && text[i + 1] === "{") {
      const close = text.indexOf("}", i + 2);
      if (close !== -1) {
        if (normal !== "") runs.push({ text: normal, kind: "normal" });
        normal = "";
        const inner = text.slice(i + 2, close);
        if (inner !== "") runs.push({ text: inner, kind: c === "_" ? "sub" : "sup" });
        i = close + 1;
        continue;
      }
    }
    normal += c;
    i++;
  }
  if (normal !== "") runs.push({ text: normal, kind: "normal" });
  return runs;
}

/**
 * Text with `_{…}`/`^{…}` markup as plain text for places that cannot show
 * sub/superscripts (`<title>`, `<desc>`, tooltips): the braces are dropped
 * and the `_`/`^` kept, so `T_{eff}` reads `T_eff`.
 *
 * @example
 * ```ts
 * import { plainTextFromMarkup } from "starlume";
 * plainTextFromMarkup("T_{eff} [K]"); // "T_eff [K]"
 * ```
 */
export function plainTextFromMarkup(text: string): string {
  return markupRuns(text)
    .map((r) => (r.kind === "sub" ? `_${r.text}` : r.kind === "sup" ? `^${r.text}` : r.text))
    .join("");
}

/**
 * Text with `_{…}`/`^{…}` markup as escaped SVG character data, the
 * sub/superscripts as `<tspan>`s shifted with `dy` (supported by every SVG
 * renderer, unlike `baseline-shift`) at 75 % size. Everything is escaped with
 * {@link escapeXml}; the result goes inside a `<text>` element whose font
 * size is `fontSize` px.
 *
 * @internal
 * @example
 * ```text
 * svgFromMarkup("f_{λ}", 12); // 'f<tspan dy="3.6" font-size="9">λ</tspan>'
 * ```
 */
export function svgFromMarkup(text: string, fontSize: number): string {
  const runs = markupRuns(text);
  const shift = { normal: 0, sub: 0.3 * fontSize, sup: -0.4 * fontSize };
  let at = 0;
  let out = "";
  for (const r of runs) {
    const want = shift[r.kind];
    const dy = want - at;
    at = want;
    const size = r.kind === "normal" ? "" : ` font-size="${px(0.75 * fontSize)}"`;
    if (dy === 0 && size === "") out += escapeXml(r.text);
    else out += `<tspan${dy !== 0 ? ` dy="${px(dy)}"` : ""}${size}>${escapeXml(r.text)}</tspan>`;
  }
  return out;
}

/**
 * Text with `_{…}`/`^{…}` markup as escaped HTML with `<sub>`/`<sup>`.
 *
 * @example
 * ```ts
 * import { htmlFromMarkup } from "starlume";
 * htmlFromMarkup("T_{eff} [K] <b>"); // "T<sub>eff</sub> [K] &lt;b&gt;"
 * ```
 */
export function htmlFromMarkup(text: string): string {
  return markupRuns(text)
    .map((r) => (r.kind === "normal" ? escapeXml(r.text) : `<${r.kind}>${escapeXml(r.text)}</${r.kind}>`))
    .join("");
}
