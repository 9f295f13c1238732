/**
 * `brand-drop`: a quantity turned into a plain number or text without saying
 * in which unit: `Number(q)`, `+q`, `String(q)`, `` `${q}` ``, `q.toFixed()`
 * and friends, `Math.*(q)`. The number means something only with its
 * system's unit; read it with `SI.valueIn(q, unit)` / format it with
 * `SI.format(q, unit)`, or use the typed function (`abs`, `sqrt`, `min`…).
 *
 * @internal
 */
import type { TSESTree } from "@typescript-eslint/utils";
import { ESLintUtils } from "@typescript-eslint/utils";
import { quantityBrand } from "../quantity-type";
import { createRule } from "./create";

const MATH_TYPED: Record<string, string> = {
  abs: "abs(q)",
  sqrt: "sqrt(q)",
  cbrt: "cbrt(q)",
  min: "min(a, b, …)",
  max: "max(a, b, …)",
  pow: "pow(q, n)",
  hypot: "sqrt(add(mul(a, a), mul(b, b)))",
};
const FORMATTERS = new Set(["toFixed", "toPrecision", "toExponential", "toString", "toLocaleString"]);

export const brandDrop = createRule({
  name: "brand-drop",
  meta: {
    type: "suggestion",
    docs: { description: "Warn where a quantity silently becomes a plain number or text." },
    messages: {
      number: "{{how}} drops the unit of {{type}}: read it with SI.valueIn(q, unit) (or CGS.valueIn), or raw(q) if the system's base unit is meant.",
      text: "{{how}} prints {{type}} without its unit: use SI.format(q, unit) (or CGS.format).",
      math: "Math.{{name}} on {{type}} returns a plain number: use {{alternative}}.",
      mathRead: "Math.{{name}} on {{type}} needs a plain number: read it first with SI.valueIn(q, unit), or use radians()/steradians() for angles.",
    },
    schema: [],
  },
  defaultOptions: [],
  create(context) {
    const services = ESLintUtils.getParserServices(context);
    const checker = services.program.getTypeChecker();
    const brandOf = (node: TSESTree.Node) => {
      const t = services.esTreeNodeToTSNodeMap.get(node);
      return quantityBrand(checker, checker.getTypeAtLocation(t), t);
    };
    return {
      UnaryExpression(node) {
        if (node.operator !== "+") return;
        const b = brandOf(node.argument);
        if (b !== null) context.report({ node, messageId: "number", data: { how: "Unary +", type: b.text } });
      },
      TemplateLiteral(node) {
        for (const e of node.expressions) {
          const b = brandOf(e);
          if (b !== null) context.report({ node: e, messageId: "text", data: { how: "A template string", type: b.text } });
        }
      },
      CallExpression(node) {
        const callee = node.callee;
        if (callee.type === "Identifier" && (callee.name === "Number" || callee.name === "String") && node.arguments[0] !== undefined) {
          const b = brandOf(node.arguments[0]);
          if (b !== null) {
            const text = callee.name === "String";
            context.report({ node, messageId: text ? "text" : "number", data: { how: `${callee.name}(…)`, type: b.text } });
          }
          return;
        }
        if (callee.type !== "MemberExpression" || callee.property.type !== "Identifier") return;
        const name = callee.property.name;
        if (callee.object.type === "Identifier" && callee.object.name === "Math") {
          for (const arg of node.arguments) {
            const b = brandOf(arg);
            if (b === null) continue;
            const alternative = MATH_TYPED[name];
            if (alternative !== undefined) context.report({ node, messageId: "math", data: { name, type: b.text, alternative } });
            else context.report({ node, messageId: "mathRead", data: { name, type: b.text } });
            return;
          }
          return;
        }
        if (FORMATTERS.has(name)) {
          const b = brandOf(callee.object);
          if (b !== null) context.report({ node, messageId: "text", data: { how: `.${name}()`, type: b.text } });
        }
      },
    };
  },
});
