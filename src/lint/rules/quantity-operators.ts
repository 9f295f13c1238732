/**
 * `quantity-operators` (strict preset): any arithmetic or comparison operator
 * with a quantity operand. The operators return plain numbers (the brand is
 * lost) and cannot check dimensions; the typed functions can.
 *
 * @internal
 */
import type { TSESTree } from "@typescript-eslint/utils";
import { ESLintUtils } from "@typescript-eslint/utils";
import { quantityBrand } from "../quantity-type";
import { createRule } from "./create";

const ALTERNATIVE: Record<string, string> = {
  "+": "add(a, b)",
  "-": "sub(a, b)",
  "*": "mul(a, b), or scale(q, k) for a plain factor",
  "/": "div(a, b), or scale(q, 1 / k)",
  "**": "pow(q, n)",
  "%": "no typed remainder: read values with SI.valueIn first",
  "<": "lt(a, b)",
  "<=": "le(a, b)",
  ">": "gt(a, b)",
  ">=": "ge(a, b)",
  "==": "near(a, b, rel)",
  "===": "near(a, b, rel)",
  "!=": "!near(a, b, rel)",
  "!==": "!near(a, b, rel)",
};

export const quantityOperators = createRule({
  name: "quantity-operators",
  meta: {
    type: "suggestion",
    docs: { description: "Forbid arithmetic and comparison operators on quantities (use the typed functions)." },
    messages: {
      operator: "'{{op}}' on a quantity ({{type}}) returns a plain number and checks nothing: use {{alternative}}.",
    },
    schema: [],
  },
  defaultOptions: [],
  create(context) {
    const services = ESLintUtils.getParserServices(context);
    const checker = services.program.getTypeChecker();
    function check(node: TSESTree.BinaryExpression | TSESTree.AssignmentExpression, op: string): void {
      const base = op.endsWith("=") && op.length >= 2 && !["==", "===", "!=", "!==", "<=", ">="].includes(op) ? op.slice(0, -1) : op;
      const alternative = ALTERNATIVE[base];
      if (alternative === undefined) return;
      for (const side of [node.left, node.right]) {
        if (side.type === "PrivateIdentifier") continue;
        const t = services.esTreeNodeToTSNodeMap.get(side);
        const b = quantityBrand(checker, checker.getTypeAtLocation(t), t);
        if (b !== null) {
          context.report({ node, messageId: "operator", data: { op, type: b.text, alternative } });
          return;
        }
      }
    }
    return {
      BinaryExpression: (node) => check(node, node.operator),
      AssignmentExpression: (node) => (node.operator === "=" ? undefined : check(node, node.operator)),
    };
  },
});
