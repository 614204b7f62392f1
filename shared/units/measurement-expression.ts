/**
 * The expression half of measurement entry (`30 x 40 + 12 x 20`, `17' - 9"`, `2 x (30 x 40)`),
 * kept apart from `read-measurement.ts` because it needs mathjs: the client loads this module only
 * when an entry is an expression; the server and the tests load it at once (parse-measurement.ts).
 *
 * Only mathjs's *parser* is used (never its evaluator): the canonical text from the reader is parsed
 * into a tree, and the tree is walked with a whitelist of node types — constants, the reader's own
 * quantity and unit symbols, parentheses and the four operators. Function calls, assignments,
 * matrices and mathjs's own units never get through.
 */
import { create, parseDependencies, type MathNode } from "mathjs";
import {
  addOrSubtract,
  divide,
  MeasurementError,
  multiply,
  plainNumber,
  UNITS,
  withUnit,
  type Dimensioned,
  type ExpressionEvaluator,
  type UnitId,
} from "./read-measurement";

// Only the parser is instantiated (no evaluate, no units), which also keeps the chunk small.
const { parse } = create({ parseDependencies } as Parameters<typeof create>[0]);

const ALLOWED_OPERATORS = new Set(["add", "subtract", "multiply", "divide"]);

function walk(node: MathNode, quantities: readonly Dimensioned[], notes: string[]): Dimensioned {
  switch (node.type) {
    case "ConstantNode": {
      const value = (node as unknown as { value: unknown }).value;
      if (typeof value !== "number" || !Number.isFinite(value)) throw new MeasurementError("Only plain numbers are allowed.");
      return plainNumber(value);
    }
    case "SymbolNode": {
      const name = (node as unknown as { name: string }).name;
      const quantity = /^q\d+$/.test(name) ? quantities[Number(name.slice(1))] : undefined;
      if (!quantity) throw new MeasurementError("Only numbers, units, +, −, x, / and parentheses are allowed.");
      return quantity;
    }
    case "ParenthesisNode": {
      const inner = walk((node as unknown as { content: MathNode }).content, quantities, notes);
      return inner.unit ? inner : { ...inner, text: `(${inner.text})`, isBareProduct: false };
    }
    case "OperatorNode": {
      const op = node as unknown as { fn: string; args: MathNode[]; implicit: boolean };
      if (!ALLOWED_OPERATORS.has(op.fn) || op.implicit || op.args.length !== 2) {
        throw new MeasurementError("Only +, −, x and / are allowed between measurements.");
      }
      const [leftNode, rightNode] = op.args as [MathNode, MathNode];
      // (group) × unit symbol, built by the reader for "(20 + 10) ft"
      if (op.fn === "multiply" && rightNode.type === "SymbolNode") {
        const name = (rightNode as unknown as { name: string }).name;
        if (name.startsWith("u_")) {
          const unit = name.slice(2) as UnitId;
          if (!Object.hasOwn(UNITS, unit)) throw new MeasurementError("Unknown unit.");
          return withUnit(walk(leftNode, quantities, notes), unit);
        }
      }
      const left = walk(leftNode, quantities, notes);
      const right = walk(rightNode, quantities, notes);
      if (op.fn === "add" || op.fn === "subtract") return addOrSubtract(left, right, op.fn === "add", notes);
      if (op.fn === "multiply") return multiply(left, right, notes);
      return divide(left, right);
    }
    default:
      // FunctionNode, AssignmentNode, ArrayNode, ... are refused.
      throw new MeasurementError("Only numbers, units, +, −, x, / and parentheses are allowed.");
  }
}

/**
 * Reads the reader's canonical expression.
 *
 * @example
 * readMeasurement("30 x 40 + 12 x 20", "area", {}, evaluateExpression) // valueSqFt: 1440
 */
export const evaluateExpression: ExpressionEvaluator = (expression, quantities, notes) => {
  let tree: MathNode;
  try {
    tree = parse(expression);
  } catch {
    throw new MeasurementError("Check the parentheses and operators in that entry.");
  }
  return walk(tree, quantities, notes);
};
