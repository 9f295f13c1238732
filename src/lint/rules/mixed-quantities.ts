/**
 * `mixed-quantities`: an operator between two quantities of different
 * dimension (`+ - % < <= > >= == === != !==` and `+= -= %=`) or of different
 * systems (any arithmetic or comparison operator, including `* /`). The
 * compiler cannot catch these: to `+` and `<` a quantity is just a `number`.
 *
 * @internal
 */
import type { TSESTree } from "@typescript-eslint/utils";
import { ESLintUtils } from "@typescript-eslint/utils";
import { compatibleSystems, dimensionDifference, dimensionText, quantityBrand, sameDimension } from "../quantity-type";
import { createRule } from "./create";

/** Operators whose operands must share a dimension. */
const SAME_DIMENSION = new Set(["+", "-", "%", "<", "<=", ">", ">=", "==", "===", "!=", "!==", "+=", "-=", "%="]);
/** Operators whose operands must share a system (dimension may differ). */
const SAME_SYSTEM = new Set(["*", "/", "*=", "/=", "**"]);

export const mixedQuantities = createRule({
  name: "mixed-quantities",
  meta: {
    type: "problem",
    docs: { description: "Forbid operators between quantities of different dimension or system." },
    messages: {
      dimension:
        "'{{op}}' between quantities of different dimension: {{left}} ({{leftDim}}) and {{right}} ({{rightDim}}) differ in {{diff}}. Convert one of them, or use the typed functions (add, sub, lt, …), which refuse the mix.",
      system:
        "'{{op}}' between a quantity in {{leftSys}} ({{left}}) and one in {{rightSys}} ({{right}}): convert one with SI.from / CGS.from first.",
    },
    schema: [],
  },
  defaultOptions: [],
  create(context) {
    const services = ESLintUtils.getParserServices(context);
    const checker = services.program.getTypeChecker();
    function check(node: TSESTree.BinaryExpression | TSESTree.AssignmentExpression, op: string): void {
      if (!SAME_DIMENSION.has(op) && !SAME_SYSTEM.has(op)) return;
      if (node.left.type === "PrivateIdentifier") return;
      const l = services.esTreeNodeToTSNodeMap.get(node.left);
      const r = services.esTreeNodeToTSNodeMap.get(node.right);
      const a = quantityBrand(checker, checker.getTypeAtLocation(l), l);
      const b = quantityBrand(checker, checker.getTypeAtLocation(r), r);
      if (a === null || b === null) return;
      const data = { op, left: a.text, right: b.text, leftDim: dimensionText(a), rightDim: dimensionText(b), leftSys: a.system, rightSys: b.system, diff: dimensionDifference(a, b) };
      if (!compatibleSystems(a, b)) {
        context.report({ node, messageId: "system", data });
        return;
      }
      if (SAME_DIMENSION.has(op) && !sameDimension(a, b)) context.report({ node, messageId: "dimension", data });
    }
    return {
      BinaryExpression: (node) => check(node, node.operator),
      AssignmentExpression: (node) => check(node, node.operator),
    };
  },
});
