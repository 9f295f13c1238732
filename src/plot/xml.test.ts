import { describe, expect, it } from "vitest";
import { escapeXml, htmlFromMarkup, plainTextFromMarkup, svgFromMarkup } from "./xml";

describe("sub- and superscript markup", () => {
  it("turns _{…} and ^{…} into <sub>/<sup> in HTML, escaping everything", () => {
    expect(htmlFromMarkup("T_{eff} [K]")).toBe("T<sub>eff</sub> [K]");
    expect(htmlFromMarkup("m^{-2}")).toBe("m<sup>-2</sup>");
    expect(htmlFromMarkup("a_{<script>} & b")).toBe("a<sub>&lt;script&gt;</sub> &amp; b");
  });

  it("keeps a lone _ or ^, or one without a closing brace, as a literal character", () => {
    expect(htmlFromMarkup("HD_123 x^2 a_{b")).toBe("HD_123 x^2 a_{b");
    expect(plainTextFromMarkup("HD_123")).toBe("HD_123");
    expect(svgFromMarkup("HD_123", 12)).toBe("HD_123");
  });

  it("gives plain text for <title> and tooltips (T_eff)", () => {
    expect(plainTextFromMarkup("T_{eff} = 5772 K, x^{2}")).toBe("T_eff = 5772 K, x^2");
  });

  it("shifts SVG subscripts down 0.3 em and superscripts up 0.4 em at 75 % size, and returns to the baseline", () => {
    // 12 px text: sub dy 3.6, sup dy −4.8, size 9.
    expect(svgFromMarkup("f_{λ} [W]", 12)).toBe('f<tspan dy="3.6" font-size="9">λ</tspan><tspan dy="-3.6"> [W]</tspan>');
    expect(svgFromMarkup("x^{2}_{i}", 12)).toBe('x<tspan dy="-4.8" font-size="9">2</tspan><tspan dy="8.4" font-size="9">i</tspan>');
    expect(svgFromMarkup("<&>_{<}", 10)).toBe(`${escapeXml("<&>")}<tspan dy="3" font-size="7.5">&lt;</tspan>`);
  });
});
