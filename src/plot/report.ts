/**
 * Standalone HTML report: one self-contained page (inline CSS, no scripts,
 * no external resources) with a title, a description, an optional results
 * table, figures (inline SVG with captions) and a closing caution note.
 * Pure string output; no DOM and no Node APIs.
 *
 * @module
 */

import { escapeXml, htmlFromMarkup } from "./xml";

/** A figure: SVG markup (as produced by `svgChart`) and its caption (`_{…}`/`^{…}` markup allowed). */
export interface ReportFigure {
  /** Standalone SVG markup, inserted as is; must start with `<svg` and contain no scripting. */
  readonly svg: string;
  /** Caption under the figure; HTML-escaped, `_{…}`/`^{…}` markup allowed. */
  readonly caption: string;
}

/** A table of text cells; header texts and the caption may carry `_{…}`/`^{…}` markup. */
export interface ReportTable {
  /** Column headings; `_{…}`/`^{…}` markup allowed. */
  readonly header: readonly string[];
  /** Rows of cell texts, each as long as `header`. */
  readonly rows: readonly (readonly string[])[];
  /** Caption above the table; `_{…}`/`^{…}` markup allowed. */
  readonly caption?: string;
  /** Right-align columns whose cells all look numeric (default true). */
  readonly alignNumbers?: boolean;
}

/** Content of {@link htmlReport}. */
export interface ReportSpec {
  /** Page title: the `<title>` and the `<h1>` heading. */
  readonly title: string;
  /** Introductory text under the heading; blank lines separate paragraphs. */
  readonly description?: string;
  /** An optional results table, after the description. */
  readonly table?: ReportTable;
  /** Figures, in order, after the table. */
  readonly figures?: readonly ReportFigure[];
  /** Caution text for the footer (e.g. validity limits of the models used). */
  readonly caution?: string;
  /** Document language (default `"en"`). */
  readonly lang?: string;
}

const NUMERIC = /^\s*[+\-−]?(?:\d+\.?\d*|\.\d+)(?:[eE][+\-]?\d+)?(?:\s*±\s*(?:\d+\.?\d*|\.\d+)(?:[eE][+\-]?\d+)?)?\s*$/;

const CSS = `
body{font-family:Helvetica,Arial,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem;color:#222;line-height:1.45}
h1{font-size:1.6rem;margin-bottom:.4rem}
.table-wrap{overflow-x:auto;margin:1rem 0;position:relative;left:50%;transform:translateX(-50%);width:max-content;max-width:calc(100vw - 2rem)}
table{border-collapse:collapse;font-size:.88rem}
caption{text-align:left;font-style:italic;padding-bottom:.3rem;caption-side:top}
th,td{border-bottom:1px solid #ddd;padding:.25rem .5rem;text-align:left;vertical-align:top;white-space:nowrap}
th{border-bottom:2px solid #555}
td.num,th.num{text-align:right;font-variant-numeric:tabular-nums}
figure{margin:2rem auto}
figure svg{display:block;max-width:100%;height:auto;margin:0 auto}
figcaption{font-size:.9rem;color:#444;margin-top:.4rem}
footer{margin-top:2rem;padding-top:.8rem;border-top:1px solid #ccc;font-size:.88rem;color:#555}
`.trim();

/**
 * Build a standalone HTML5 page. Every piece of text (title, description,
 * table cells, captions, caution) is HTML-escaped; multi-line text keeps its
 * paragraphs (blank-line separated). Table headers, the table caption and
 * figure captions may carry `_{…}` (subscript) and `^{…}` (superscript)
 * markup, drawn with `<sub>`/`<sup>`. Table cells do not wrap (the table
 * scrolls sideways in a narrow window); each figure is centred and its
 * caption is no wider than the figure. Figure markup is inserted as is, so it
 * must come from a trusted builder such as `svgChart`; as a safeguard, markup
 * that does not start with `<svg` or that contains `<script`, `<foreignObject`
 * or an `on…=` event attribute is refused.
 *
 * @param spec - page content, see {@link ReportSpec}.
 * @returns the HTML document.
 * @throws RangeError naming the figure when its markup is refused, or the
 *   table row whose length differs from the header.
 *
 * @example
 * ```ts
 * import { htmlReport } from "starlume";
 * const html = htmlReport({
 *   title: "Fit of HD 140283",
 *   description: "Blackbody fit to 5 photometric points.",
 *   table: { header: ["band", "flux [Jy]"], rows: [["V", "12.3"]] },
 *   figures: [],
 *   caution: "Blackbody model: ignores line blanketing.",
 * });
 * ```
 */
export function htmlReport(spec: ReportSpec): string {
  const o: string[] = [];
  const lang = escapeXml(spec.lang ?? "en");
  o.push("<!DOCTYPE html>");
  o.push(`<html lang="${lang}">`);
  o.push("<head>");
  o.push('<meta charset="utf-8">');
  o.push('<meta name="viewport" content="width=device-width, initial-scale=1">');
  o.push(`<title>${escapeXml(spec.title)}</title>`);
  o.push(`<style>${CSS}</style>`);
  o.push("</head>");
  o.push("<body>");
  o.push("<main>");
  o.push(`<h1>${escapeXml(spec.title)}</h1>`);
  if (spec.description !== undefined && spec.description.trim() !== "") o.push(paragraphs(spec.description));
  if (spec.table !== undefined) o.push(table(spec.table));
  (spec.figures ?? []).forEach((f, i) => {
    checkSvg(f.svg, i);
    // The figure is as wide as its SVG (so the caption is no wider) and centred.
    const w = /^<svg\b[^>]*?\swidth="(\d+(?:\.\d+)?)"/.exec(f.svg.trim())?.[1];
    o.push(w !== undefined ? `<figure style="max-width:${w}px">` : "<figure>");
    o.push(f.svg.trim());
    o.push(`<figcaption>${htmlFromMarkup(f.caption)}</figcaption>`);
    o.push("</figure>");
  });
  o.push("</main>");
  if (spec.caution !== undefined && spec.caution.trim() !== "") {
    o.push("<footer>");
    o.push(paragraphs(spec.caution));
    o.push("</footer>");
  }
  o.push("</body>");
  o.push("</html>");
  return o.join("\n") + "\n";
}

function paragraphs(text: string): string {
  return text
    .split(/\r?\n\s*\r?\n/)
    .map((p) => p.trim())
    .filter((p) => p !== "")
    .map((p) => `<p>${escapeXml(p)}</p>`)
    .join("\n");
}

function table(t: ReportTable): string {
  const n = t.header.length;
  t.rows.forEach((r, i) => {
    if (r.length !== n) throw new RangeError(`table.rows[${i}] has ${r.length} cells; the header has ${n}`);
  });
  const numeric = t.header.map(
    (_, k) => (t.alignNumbers ?? true) && t.rows.length > 0 && t.rows.every((r) => (r[k] ?? "") === "" || NUMERIC.test(r[k] ?? "")),
  );
  const o: string[] = ['<div class="table-wrap">', "<table>"];
  if (t.caption !== undefined) o.push(`<caption>${htmlFromMarkup(t.caption)}</caption>`);
  o.push(`<thead><tr>${t.header.map((h, k) => `<th scope="col"${numeric[k] === true ? ' class="num"' : ""}>${htmlFromMarkup(h)}</th>`).join("")}</tr></thead>`);
  o.push("<tbody>");
  for (const r of t.rows) {
    o.push(`<tr>${r.map((c, k) => `<td${numeric[k] === true ? ' class="num"' : ""}>${escapeXml(c)}</td>`).join("")}</tr>`);
  }
  o.push("</tbody>");
  o.push("</table>");
  o.push("</div>");
  return o.join("\n");
}

function checkSvg(svg: string, i: number): void {
  const s = svg.trim();
  if (!s.startsWith("<svg")) throw new RangeError(`figures[${i}].svg must start with <svg`);
  if (/<script|<foreignObject|<[^>]*\son[a-z]+\s*=|<[^>]*=\s*["']?\s*javascript:/i.test(s)) {
    throw new RangeError(`figures[${i}].svg contains scripting (script, foreignObject, on… attribute or javascript: URL); refused`);
  }
}
