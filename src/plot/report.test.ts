import { describe, expect, it } from "vitest";
import { htmlReport } from "./report";
import { svgChart } from "./svg";
import { xmlProblems } from "./xml-check.test-util";

const evil = `<img src=x onerror="alert(1)"> & "quotes"`;

describe("htmlReport", () => {
  const svg = svgChart({ title: "fig", series: [{ type: "line", name: "a", x: [1, 2], y: [1, 2] }] });
  const html = htmlReport({
    title: `Report ${evil}`,
    description: `First paragraph ${evil}\n\nSecond paragraph`,
    table: { header: ["star", "teff [K]"], rows: [["Sun", "5772 ± 1"], [evil, "9602"]], caption: "Results" },
    figures: [{ svg, caption: `Figure 1 ${evil}` }],
    caution: "Blackbody model only.",
  });

  it("is a standalone page: doctype, charset, inline CSS, no scripts or external resources", () => {
    expect(html.startsWith("<!DOCTYPE html>\n<html lang=\"en\">")).toBe(true);
    expect(html).toContain('<meta charset="utf-8">');
    expect(html).toContain("<style>");
    const tags = html.match(/<[^>]*>/g) ?? [];
    expect(tags.length).toBeGreaterThan(20);
    for (const tag of tags) {
      expect(tag).not.toMatch(/^<(?:script|link|img|iframe|object|embed)\b/i);
      expect(tag).not.toMatch(/\s(?:src|href|on[a-z]+)\s*=/i);
    }
    expect(html).not.toMatch(/url\(|@import/i);
  });

  it("escapes every piece of text", () => {
    expect(html).toContain("<title>Report &lt;img src=x onerror=&quot;alert(1)&quot;&gt; &amp; &quot;quotes&quot;</title>");
    expect(html).toContain("<td>&lt;img src=x");
    expect(html).toContain("<figcaption>Figure 1 &lt;img");
    expect(html.match(/<p>/g)).toHaveLength(3); // two description paragraphs + the caution
  });

  it("body markup (main + footer) is balanced and well-formed", () => {
    const body = /<body>([\s\S]*)<\/body>/.exec(html)?.[1] ?? "";
    expect(xmlProblems(`<body>${body}</body>`)).toEqual([]);
    expect(body).toContain("<footer>\n<p>Blackbody model only.</p>\n</footer>");
    expect(body).toContain("<svg xmlns=");
  });

  it("right-aligns numeric columns (including value ± uncertainty)", () => {
    expect(html).toContain('<td class="num">5772 ± 1</td>');
    expect(html).toContain("<td>Sun</td>");
  });

  it("refuses unsafe figure markup and ragged tables", () => {
    expect(() => htmlReport({ title: "t", figures: [{ svg: "<div/>", caption: "" }] })).toThrow(/figures\[0\].*<svg/);
    expect(() => htmlReport({ title: "t", figures: [{ svg: '<svg onload="x()"/>', caption: "" }] })).toThrow(/scripting/);
    expect(() => htmlReport({ title: "t", figures: [{ svg: "<svg><script>x()</script></svg>", caption: "" }] })).toThrow(/scripting/);
    expect(() => htmlReport({ title: "t", table: { header: ["a", "b"], rows: [["1"]] } })).toThrow(/rows\[0\] has 1 cells/);
  });

  it("accepts chart text that merely mentions 'on' words", () => {
    const s = svgChart({ title: "position one = 3, javascript: none" });
    expect(() => htmlReport({ title: "t", figures: [{ svg: s, caption: "" }] })).not.toThrow();
  });

  it("wraps the table for sideways scrolling, keeps cells on one line, and draws header/caption markup", () => {
    const page = htmlReport({
      title: "t",
      table: { header: ["T_{eff} [K]", "R [R_{☉}] <x>"], rows: [["5772 ± 1", "1.00"]], caption: "Fitted T_{eff} & R" },
    });
    expect(page).toContain('<div class="table-wrap">\n<table>\n<caption>Fitted T<sub>eff</sub> &amp; R</caption>');
    expect(page).toContain('<th scope="col" class="num">T<sub>eff</sub> [K]</th><th scope="col" class="num">R [R<sub>☉</sub>] &lt;x&gt;</th>');
    expect(page).toMatch(/th,td\{[^}]*white-space:nowrap/);
    expect(page).toMatch(/\.table-wrap\{[^}]*overflow-x:auto/);
    const body = /<body>([\s\S]*)<\/body>/.exec(page)?.[1] ?? "";
    expect(xmlProblems(`<body>${body}</body>`)).toEqual([]);
  });

  it("sizes each figure to its SVG's width (caption no wider), centred, with caption markup", () => {
    const s = svgChart({ title: "w", width: 640 });
    const page = htmlReport({ title: "t", figures: [{ svg: s, caption: "B_{λ} <i>" }] });
    expect(page).toContain('<figure style="max-width:640px">');
    expect(page).toContain("<figcaption>B<sub>λ</sub> &lt;i&gt;</figcaption>");
    expect(page).toMatch(/figure\{margin:[\d.]+rem auto\}/);
  });
});
