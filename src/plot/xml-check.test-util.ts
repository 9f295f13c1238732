/**
 * A tiny XML well-formedness checker for tests (no DOMParser in Node).
 * Checks: the whole input is covered by tokens (no stray `<`), tags balance,
 * one root element, attributes are `name="value"` / `name='value'` with unique
 * names, and every `&` starts a predefined or numeric entity.
 * Returns a list of problems (empty when well-formed).
 */
export function xmlProblems(xml: string): string[] {
  const problems: string[] = [];
  const token = /<!--[\s\S]*?-->|<\?[\s\S]*?\?>|<!DOCTYPE[^>]*>|<\/?[A-Za-z_][^<>]*>|[^<]+/gy;
  const startTag = /^<([A-Za-z_][\w.:-]*)((?:\s+[A-Za-z_:][\w.:-]*\s*=\s*(?:"[^"<]*"|'[^'<]*'))*)\s*(\/?)>$/;
  const attr = /([A-Za-z_:][\w.:-]*)\s*=\s*(?:"([^"<]*)"|'([^'<]*)')/g;
  const badAmp = /&(?!(?:amp|lt|gt|quot|apos|#\d+|#x[0-9A-Fa-f]+);)/;
  const stack: string[] = [];
  let roots = 0;
  let pos = 0;
  while (pos < xml.length) {
    token.lastIndex = pos;
    const m = token.exec(xml);
    if (m === null) {
      problems.push(`unparseable text at offset ${pos}: ${JSON.stringify(xml.slice(pos, pos + 30))}`);
      break;
    }
    const t = m[0];
    pos += t.length;
    if (t.startsWith("<!--") || t.startsWith("<?") || t.startsWith("<!")) continue;
    if (t.startsWith("</")) {
      const name = /^<\/([A-Za-z_][\w.:-]*)\s*>$/.exec(t)?.[1];
      if (name === undefined) problems.push(`bad end tag ${t}`);
      else if (stack.pop() !== name) problems.push(`mismatched end tag ${t}`);
      continue;
    }
    if (t.startsWith("<")) {
      const s = startTag.exec(t);
      if (s === null) {
        problems.push(`bad start tag ${t.slice(0, 80)}`);
        continue;
      }
      const seen = new Set<string>();
      for (const a of (s[2] ?? "").matchAll(attr)) {
        const name = a[1] ?? "";
        if (seen.has(name)) problems.push(`duplicate attribute ${name} in ${t.slice(0, 60)}`);
        seen.add(name);
        if (badAmp.test(a[2] ?? a[3] ?? "")) problems.push(`raw & in attribute ${name}`);
      }
      if (stack.length === 0) roots++;
      if (s[3] !== "/") stack.push(s[1] ?? "");
      continue;
    }
    if (stack.length === 0 && t.trim() !== "") problems.push(`text outside the root: ${JSON.stringify(t.slice(0, 30))}`);
    if (badAmp.test(t)) problems.push(`raw & in text: ${JSON.stringify(t.slice(0, 40))}`);
  }
  if (stack.length > 0) problems.push(`unclosed: ${stack.join(" > ")}`);
  if (roots !== 1) problems.push(`expected one root element, found ${roots}`);
  return problems;
}
