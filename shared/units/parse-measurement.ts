/**
 * Measurement entry as an estimator types it in the attic: `24' 6"`, `24 ft 6 in`, `7.5 m`,
 * `750 cm`, a plain `24` (feet), or an area such as `30 x 40 + 12 x 20`, `120 m2`, `1200 sq ft`.
 *
 * How it stays safe: the text is first cut into a small set of known tokens (numbers, unit words,
 * + − × ÷ and parentheses); anything else is refused with a message. Only then is a canonical
 * expression handed to mathjs's *parser* (never its evaluator), and the parse tree is walked with a
 * whitelist of node types — constants, our own unit symbols, parentheses and the four operators.
 * Function calls, assignments, matrices and mathjs's own units never get through.
 *
 * Unit factors come from convert-units inside each system (inches → feet, cm → m). The bridge
 * between metric and imperial uses the exact definition 1 ft = 0.3048 m (NIST SP 811 App. B),
 * because convert-units 2.3.4 bridges with the rounded 3.28084 ft/m.
 */
import { create, parseDependencies, type MathNode } from "mathjs";
import convert from "convert-units";
import { formatNumber, M_PER_FT, SQ_M_PER_SQ_FT } from "./format";

export type ParseLengthResult =
  | { ok: true; kind: "length"; valueFt: number; understood: string }
  | { ok: false; message: string };

export type ParseAreaResult =
  | { ok: true; kind: "area"; valueSqFt: number; understood: string }
  | { ok: false; message: string };

export type ParseMeasurementResult =
  | { ok: true; kind: "length"; valueFt: number; understood: string }
  | { ok: true; kind: "area"; valueSqFt: number; understood: string }
  | { ok: false; message: string };

export interface ParseOptions {
  /** Accept 0 (e.g. "0 ft below the ridge"). Default false: a measurement must be positive. */
  allowZero?: boolean;
}

/** Longest text accepted; a measurement never needs more. */
export const MAX_MEASUREMENT_CHARS = 200;
/** Largest length accepted (ft). No single attic dimension comes near it. */
export const MAX_LENGTH_FT = 10_000;
/** Largest area accepted (sq ft). */
export const MAX_AREA_SQFT = 1_000_000;

type LengthUnit = "ft" | "in" | "yd" | "m" | "cm" | "mm";
type AreaUnit = "ft2" | "in2" | "yd2" | "m2" | "cm2";
type UnitId = LengthUnit | AreaUnit;

interface UnitInfo {
  dim: 1 | 2;
  /** Label used in the `understood` text. */
  label: string;
  /** Size of one of this unit in ft (dim 1) or sq ft (dim 2). */
  factor: number;
  /** Rank within its dimension, larger = bigger unit; used to print "24 ft 6 in" without a "+". */
  rank: number;
}

const IMPERIAL_LENGTH = new Set<LengthUnit>(["ft", "in", "yd"]);
const IMPERIAL_AREA = new Set<AreaUnit>(["ft2", "in2", "yd2"]);

function lengthFactorFt(unit: LengthUnit): number {
  // Within a system convert-units is exact (in → ft is 1/12); across systems use 0.3048 exactly.
  if (IMPERIAL_LENGTH.has(unit)) return convert(1).from(unit).to("ft");
  return convert(1).from(unit).to("m") / M_PER_FT;
}

function areaFactorSqFt(unit: AreaUnit): number {
  // @types/convert-units omits "yd2", which convert-units 2.3.4 itself defines (to_anchor 9).
  const from = unit as "ft2";
  if (IMPERIAL_AREA.has(unit)) return convert(1).from(from).to("ft2");
  return convert(1).from(from).to("m2") / SQ_M_PER_SQ_FT;
}

const UNITS: Record<UnitId, UnitInfo> = {
  yd: { dim: 1, label: "yd", factor: lengthFactorFt("yd"), rank: 5 },
  ft: { dim: 1, label: "ft", factor: lengthFactorFt("ft"), rank: 4 },
  in: { dim: 1, label: "in", factor: lengthFactorFt("in"), rank: 3 },
  m: { dim: 1, label: "m", factor: lengthFactorFt("m"), rank: 2 },
  cm: { dim: 1, label: "cm", factor: lengthFactorFt("cm"), rank: 1 },
  mm: { dim: 1, label: "mm", factor: lengthFactorFt("mm"), rank: 0 },
  yd2: { dim: 2, label: "sq yd", factor: areaFactorSqFt("yd2"), rank: 4 },
  ft2: { dim: 2, label: "sq ft", factor: areaFactorSqFt("ft2"), rank: 3 },
  in2: { dim: 2, label: "sq in", factor: areaFactorSqFt("in2"), rank: 2 },
  m2: { dim: 2, label: "m²", factor: areaFactorSqFt("m2"), rank: 1 },
  cm2: { dim: 2, label: "cm²", factor: areaFactorSqFt("cm2"), rank: 0 },
};

/** Unit spellings, matched longest first. Letters must not continue after a word match. */
const UNIT_ALIASES: ReadonlyArray<readonly [string, UnitId]> = (
  [
    ["square feet", "ft2"], ["square foot", "ft2"], ["sq. ft.", "ft2"], ["sq. ft", "ft2"],
    ["sq ft", "ft2"], ["sqft", "ft2"], ["ft^2", "ft2"], ["ft²", "ft2"], ["ft2", "ft2"], ["sf", "ft2"],
    ["square inches", "in2"], ["square inch", "in2"], ["sq. in.", "in2"], ["sq. in", "in2"],
    ["sq in", "in2"], ["sqin", "in2"], ["in^2", "in2"], ["in²", "in2"], ["in2", "in2"],
    ["square yards", "yd2"], ["square yard", "yd2"], ["sq yd", "yd2"], ["yd^2", "yd2"], ["yd²", "yd2"], ["yd2", "yd2"],
    ["square meters", "m2"], ["square metres", "m2"], ["square meter", "m2"], ["square metre", "m2"],
    ["sq m", "m2"], ["sqm", "m2"], ["m^2", "m2"], ["m²", "m2"], ["m2", "m2"],
    ["square centimeters", "cm2"], ["square centimetres", "cm2"], ["sq cm", "cm2"], ["cm^2", "cm2"], ["cm²", "cm2"], ["cm2", "cm2"],
    ["feet", "ft"], ["foot", "ft"], ["ft.", "ft"], ["ft", "ft"], ["'", "ft"],
    ["inches", "in"], ["inch", "in"], ["in.", "in"], ["in", "in"], ['"', "in"],
    ["yards", "yd"], ["yard", "yd"], ["yd", "yd"],
    ["millimeters", "mm"], ["millimetres", "mm"], ["mm", "mm"],
    ["centimeters", "cm"], ["centimetres", "cm"], ["cm", "cm"],
    ["meters", "m"], ["metres", "m"], ["meter", "m"], ["metre", "m"], ["m", "m"],
  ] as const
)
  .slice()
  .sort((a, b) => b[0].length - a[0].length);

type Token =
  | { t: "num"; value: number; text: string }
  | { t: "unit"; unit: UnitId }
  | { t: "op"; op: "+" | "-" | "*" | "/" }
  | { t: "paren"; p: "(" | ")" };

class MeasurementError extends Error {}

// Only the parser is instantiated (no evaluate, no units), which also keeps the client bundle small.
const { parse } = create({ parseDependencies } as Parameters<typeof create>[0]);

const NUMBER_RE = /^(?:\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d*)?|\.\d+)/;
const MAX_NUMBER_DIGITS = 9;

function normalize(text: string): string {
  return text
    .toLowerCase()
    .replace(/[\u2018\u2019\u2032]/g, "'") // ‘ ’ ′ → foot mark
    .replace(/[\u201C\u201D\u2033]/g, '"') // “ ” ″ → inch mark
    .replace(/''/g, '"') // two foot marks typed as an inch mark
    .replace(/[\u00D7\u2715\u2716]/g, " x ") // × ✕ ✖
    .replace(/\u00F7/g, "/")
    .replace(/[\u2212\u2013]/g, "-")
    .trim();
}

function tokenize(text: string): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const rest = text.slice(i);
    const ch = text[i]!;
    if (/\s/.test(ch)) {
      i += 1;
      continue;
    }
    const num = NUMBER_RE.exec(rest);
    if (num) {
      const raw = num[0];
      const digits = raw.replace(/[,.]/g, "").replace(/^0+/, "");
      const integerDigits = raw.split(".")[0]!.replace(/,/g, "").replace(/^0+/, "");
      if (integerDigits.length > MAX_NUMBER_DIGITS || digits.length > 15) {
        throw new MeasurementError(`"${raw}" is too large a number for a measurement.`);
      }
      const value = Number(raw.replace(/,/g, ""));
      if (!Number.isFinite(value)) throw new MeasurementError(`"${raw}" is not a number I can use.`);
      tokens.push({ t: "num", value, text: raw });
      i += raw.length;
      if (text[i] === ",") {
        throw new MeasurementError(
          `I could not read "${raw}${text.slice(i, i + 3)}": use a point for decimals (7.5) and commas only for thousands (1,200).`,
        );
      }
      continue;
    }
    if ("+-*/()".includes(ch)) {
      if (ch === "(" || ch === ")") tokens.push({ t: "paren", p: ch });
      else tokens.push({ t: "op", op: ch as "+" | "-" | "*" | "/" });
      i += 1;
      continue;
    }
    // "x" and "by" mean "times" between two dimensions.
    if (/^(?:x|by)(?![a-z])/.test(rest)) {
      tokens.push({ t: "op", op: "*" });
      i += rest.startsWith("by") ? 2 : 1;
      continue;
    }
    const alias = UNIT_ALIASES.find(([spelling]) => {
      if (!rest.startsWith(spelling)) return false;
      const last = spelling[spelling.length - 1]!;
      const next = rest[spelling.length];
      // A word unit must end at a word boundary ("min" is not "m" + "in").
      return !(/[a-z]/.test(last) && next !== undefined && /[a-z0-9]/.test(next));
    });
    if (alias) {
      tokens.push({ t: "unit", unit: alias[1] });
      i += alias[0].length;
      continue;
    }
    const word = /^[a-z]+/.exec(rest)?.[0] ?? ch;
    throw new MeasurementError(
      `I don't understand "${word}". Use numbers with ft, in, ' or ", m, cm, mm, sq ft or m², and + or × (for example 24' 6", 7.5 m or 30 x 40 + 12 x 20).`,
    );
  }
  return tokens;
}

/**
 * Turns tokens into canonical mathjs text. Adds the implied operators of trade notation:
 * "24 ft 6 in" and "24' 6" are sums (a bare number right after feet is inches), "6 1/2" is a
 * mixed number, and a unit applies to the number or parenthesised group before it.
 */
function toCanonical(tokens: Token[]): { expression: string; notes: string[] } {
  const parts: string[] = [];
  const notes: string[] = [];
  // What the previous emitted item was, to decide where an implied "+" goes.
  let prev: "start" | "op" | "open" | "close" | "num" | "quantity" = "start";
  let prevUnit: UnitId | null = null;

  for (let k = 0; k < tokens.length; k += 1) {
    const tok = tokens[k]!;
    if (tok.t === "num") {
      if (prev === "num" || prev === "close") {
        throw new MeasurementError(
          `Two numbers in a row ("${tok.text}"): put a unit after each number, or + or x between them.`,
        );
      }
      const impliedPlus = prev === "quantity";
      if (impliedPlus) parts.push("+");
      // Mixed number "6 1/2": folded into one constant so it prints as 6.5.
      const afterNum = tokens[k + 1];
      const slashTok = tokens[k + 2];
      const denomTok = tokens[k + 3];
      if (afterNum?.t === "num" && slashTok?.t === "op" && slashTok.op === "/" && denomTok?.t === "num") {
        if (denomTok.value === 0) throw new MeasurementError("Can't divide by zero.");
        parts.push(String(tok.value + afterNum.value / denomTok.value));
        k += 3;
      } else if (
        afterNum?.t === "op" &&
        afterNum.op === "/" &&
        slashTok?.t === "num" &&
        !(tokens[k - 1]?.t === "op" && (tokens[k - 1] as { op: string }).op === "/")
      ) {
        // A simple fraction "1/2" binds tighter than a following unit: 1/2" is half an inch.
        if (slashTok.value === 0) throw new MeasurementError("Can't divide by zero.");
        parts.push(String(tok.value / slashTok.value));
        k += 2;
      } else {
        parts.push(String(tok.value));
      }
      const unitTok = tokens[k + 1];
      if (impliedPlus && unitTok?.t !== "unit") {
        // "24' 6": a bare number after feet is inches, as a tape is read.
        if (prevUnit === "ft") {
          parts.push("* u_in");
          notes.push("a number after feet is read as inches");
          prev = "quantity";
          prevUnit = "in";
          continue;
        }
        throw new MeasurementError(
          `Add a unit after "${tok.text}", or + or x before it.`,
        );
      }
      prev = "num";
      continue;
    }
    if (tok.t === "unit") {
      if (prev !== "num" && prev !== "close") {
        throw new MeasurementError(`A unit needs a number before it (for example 24 ft).`);
      }
      // Wrap the number (or group) with its unit so "30 ft x 40 ft" keeps precedence.
      if (prev === "num") {
        const last = parts.pop()!;
        parts.push(`(${last} * u_${tok.unit})`);
      } else {
        // A unit after ")" applies to the whole group.
        let depth = 0;
        let start = parts.length - 1;
        for (; start >= 0; start -= 1) {
          if (parts[start] === ")") depth += 1;
          if (parts[start] === "(") depth -= 1;
          if (depth === 0) break;
        }
        const group = parts.splice(start).join(" ");
        parts.push(`(${group} * u_${tok.unit})`);
      }
      prev = "quantity";
      prevUnit = tok.unit;
      continue;
    }
    if (tok.t === "op") {
      if (tok.op === "-" && (prev === "start" || prev === "op" || prev === "open")) {
        throw new MeasurementError("A measurement can't be negative.");
      }
      if (prev === "start" || prev === "op" || prev === "open") {
        throw new MeasurementError(`"${tok.op === "*" ? "x" : tok.op}" needs a measurement before it.`);
      }
      parts.push(tok.op);
      prev = "op";
      prevUnit = null;
      continue;
    }
    if (tok.p === "(") {
      if (prev === "quantity") parts.push("+");
      else if (prev === "num" || prev === "close") {
        throw new MeasurementError('Put + or x before "(".');
      }
      parts.push("(");
      prev = "open";
    } else {
      if (prev === "op" || prev === "open" || prev === "start") {
        throw new MeasurementError('Something is missing before ")".');
      }
      parts.push(")");
      prev = "close";
    }
  }
  if (prev === "op") throw new MeasurementError("The entry ends with an operator; finish the measurement.");
  return { expression: parts.join(" "), notes };
}

/** A value while walking the tree: dim 0 = plain number, 1 = length (ft), 2 = area (sq ft). */
interface Dimensioned {
  value: number;
  dim: 0 | 1 | 2;
  /** A plain number with no unit of its own, whose unit is decided by context. */
  isBare: boolean;
  text: string;
  /** Set when this node is exactly number × unit, for "24 ft 6 in" printing. */
  unit?: UnitId;
  /** An area made by "a x b" of plain numbers, not yet wrapped in parentheses. */
  isBareProduct?: boolean;
}

const ALLOWED_OPERATORS = new Set(["add", "subtract", "multiply", "divide"]);

function asFeet(v: Dimensioned): Dimensioned {
  return { value: v.value, dim: 1, isBare: false, text: `${v.text} ft`, unit: "ft" };
}

function asSqFt(v: Dimensioned): Dimensioned {
  return { value: v.value, dim: 2, isBare: false, text: `${v.text} sq ft`, unit: "ft2" };
}

function promote(v: Dimensioned, dim: 1 | 2): Dimensioned {
  return dim === 1 ? asFeet(v) : asSqFt(v);
}

function walk(node: MathNode, notes: string[]): Dimensioned {
  switch (node.type) {
    case "ConstantNode": {
      const value = (node as unknown as { value: unknown }).value;
      if (typeof value !== "number" || !Number.isFinite(value)) {
        throw new MeasurementError("Only plain numbers are allowed.");
      }
      return { value, dim: 0, isBare: true, text: formatNumber(value, { maxFractionDigits: 4 }) };
    }
    case "ParenthesisNode": {
      const inner = walk((node as unknown as { content: MathNode }).content, notes);
      return inner.unit ? inner : { ...inner, text: `(${inner.text})`, isBareProduct: false };
    }
    case "OperatorNode": {
      const op = node as unknown as { fn: string; args: MathNode[]; implicit: boolean };
      if (!ALLOWED_OPERATORS.has(op.fn) || op.implicit || op.args.length !== 2) {
        throw new MeasurementError("Only +, −, x and / are allowed between measurements.");
      }
      const [leftNode, rightNode] = op.args as [MathNode, MathNode];
      // number × unit symbol, built by toCanonical
      if (op.fn === "multiply" && rightNode.type === "SymbolNode") {
        const name = (rightNode as unknown as { name: string }).name;
        const unit = name.startsWith("u_") ? (name.slice(2) as UnitId) : undefined;
        const info = unit ? UNITS[unit] : undefined;
        if (!unit || !info) throw new MeasurementError("Unknown unit.");
        const left = walk(leftNode, notes);
        if (left.dim !== 0) throw new MeasurementError(`"${info.label}" can only follow a plain number.`);
        return {
          value: left.value * info.factor,
          dim: info.dim,
          isBare: false,
          text: `${left.text} ${info.label}`,
          unit,
        };
      }
      const left = walk(leftNode, notes);
      const right = walk(rightNode, notes);
      switch (op.fn) {
        case "add":
        case "subtract": {
          let a = left;
          let b = right;
          if (a.dim !== b.dim) {
            // A plain number beside a measurement takes the default unit of that measurement.
            if (a.isBare && a.dim === 0 && b.dim > 0) a = promote(a, b.dim as 1 | 2);
            else if (b.isBare && b.dim === 0 && a.dim > 0) b = promote(b, a.dim as 1 | 2);
            else throw new MeasurementError("Can't add a length to an area.");
            notes.push(`a plain number beside a measurement is read as ${a.dim === 2 ? "sq ft" : "ft"}`);
          }
          const isAdd = op.fn === "add";
          const unitsDescend =
            isAdd && a.unit && b.unit && UNITS[a.unit].dim === 1 && UNITS[a.unit].rank > UNITS[b.unit].rank;
          const text = isAdd
            ? unitsDescend
              ? `${a.text} ${b.text}`
              : `${a.text} + ${b.text}`
            : `${a.text} − ${b.text}`;
          return {
            value: isAdd ? a.value + b.value : a.value - b.value,
            dim: a.dim,
            isBare: a.isBare && b.isBare,
            text,
          };
        }
        case "multiply": {
          let a = left;
          let b = right;
          if ((a.isBareProduct && b.isBare) || (b.isBareProduct && a.isBare)) {
            // "2 x 30 x 40" could be two 30 x 40 areas or a volume: ask for parentheses.
            throw new MeasurementError(
              "Three plain numbers multiplied is ambiguous: for a count of areas write 2 x (30 x 40).",
            );
          }
          const isBareProduct = a.isBare && b.isBare;
          // "30 x 40": two plain numbers multiplied are two lengths in feet.
          if (a.isBare && b.isBare) {
            a = asFeet(a);
            b = asFeet(b);
          } else if (a.isBare && b.dim === 1) a = asFeet(a);
          else if (b.isBare && a.dim === 1) b = asFeet(b);
          // A plain number times an area is a count ("2 x (30 x 40)").
          const dim = a.dim + b.dim;
          if (dim > 2) {
            throw new MeasurementError(
              "That multiplies too many lengths (a length × a length is already an area).",
            );
          }
          if (isBareProduct) notes.push("plain numbers are read as feet");
          return {
            value: a.value * b.value,
            dim: dim as 0 | 1 | 2,
            isBare: false,
            text: `${a.text} × ${b.text}`,
            isBareProduct,
          };
        }
        case "divide": {
          if (right.dim !== 0) throw new MeasurementError("You can only divide by a plain number.");
          if (right.value === 0) throw new MeasurementError("Can't divide by zero.");
          return {
            value: left.value / right.value,
            dim: left.dim,
            isBare: left.isBare,
            text: `${left.text}/${right.text}`,
          };
        }
      }
      throw new MeasurementError("Only +, −, x and / are allowed between measurements.");
    }
    default:
      // SymbolNode outside number × unit, FunctionNode, AssignmentNode, ArrayNode, ... are refused.
      throw new MeasurementError("Only numbers, units, +, −, x, / and parentheses are allowed.");
  }
}

type Wanted = "length" | "area" | "either";

function evaluate(text: unknown, wanted: Wanted, options: ParseOptions): ParseMeasurementResult {
  try {
    if (typeof text !== "string") return { ok: false, message: "Enter a measurement." };
    const normalized = normalize(text);
    if (normalized === "") return { ok: false, message: "Enter a measurement." };
    if (normalized.length > MAX_MEASUREMENT_CHARS) {
      return { ok: false, message: `That entry is too long (over ${MAX_MEASUREMENT_CHARS} characters).` };
    }
    const tokens = tokenize(normalized);
    const { expression, notes } = toCanonical(tokens);
    let tree: MathNode;
    try {
      tree = parse(expression);
    } catch {
      return { ok: false, message: "Check the parentheses and operators in that entry." };
    }
    let result = walk(tree, notes);
    if (result.dim === 0) {
      result = wanted === "area" ? asSqFt(result) : asFeet(result);
      notes.push(`a plain number is read as ${wanted === "area" ? "sq ft" : "feet"}`);
    }
    if (!Number.isFinite(result.value)) return { ok: false, message: "That measurement is not a usable number." };
    if (result.value < 0) return { ok: false, message: "A measurement can't be negative." };
    if (result.value === 0 && !options.allowZero) {
      return { ok: false, message: "A measurement must be more than zero." };
    }
    const noteText = notes.length > 0 ? ` (${[...new Set(notes)].join("; ")})` : "";
    if (result.dim === 1) {
      if (wanted === "area") {
        return { ok: false, message: "That is a length; for an area give two sides (30 x 40) or a unit such as sq ft or m²." };
      }
      if (result.value > MAX_LENGTH_FT) {
        return { ok: false, message: `That is longer than ${formatNumber(MAX_LENGTH_FT)} ft, more than any attic measurement.` };
      }
      const valueFt = result.value;
      const total = `${formatNumber(valueFt, { maxFractionDigits: valueFt < 1 ? 4 : 2 })} ft`;
      const understood = `${result.text === total ? total : `${result.text} = ${total}`}${noteText}`;
      return { ok: true, kind: "length", valueFt, understood };
    }
    if (wanted === "length") {
      return { ok: false, message: "That is an area; a single length is expected here (for example 24' 6\")." };
    }
    if (result.value > MAX_AREA_SQFT) {
      return { ok: false, message: `That is more than ${formatNumber(MAX_AREA_SQFT)} sq ft, more than any attic.` };
    }
    const valueSqFt = result.value;
    const total = `${formatNumber(valueSqFt, { maxFractionDigits: 2 })} sq ft`;
    const understood = `${result.text === total ? total : `${result.text} = ${total}`}${noteText}`;
    return { ok: true, kind: "area", valueSqFt, understood };
  } catch (error) {
    if (error instanceof MeasurementError) return { ok: false, message: error.message };
    return { ok: false, message: "I could not read that measurement." };
  }
}

/**
 * Reads a length or an area, whichever the text is. A plain number is feet.
 *
 * @example
 * parseMeasurement(`24' 6"`) // { ok: true, kind: "length", valueFt: 24.5, understood: "24 ft 6 in = 24.5 ft" }
 * parseMeasurement("30 x 40 + 12 x 20") // { ok: true, kind: "area", valueSqFt: 1440, ... }
 */
export function parseMeasurement(text: string, options: ParseOptions = {}): ParseMeasurementResult {
  return evaluate(text, "either", options);
}

/**
 * Reads a length in feet; a plain number is feet. Never throws.
 *
 * @example
 * parseLengthFt("24 ft 6 in") // { ok: true, kind: "length", valueFt: 24.5, understood: "24 ft 6 in = 24.5 ft" }
 * parseLengthFt("7.5 m") // valueFt ≈ 24.606 (7.5 ÷ 0.3048)
 */
export function parseLengthFt(text: string, options: ParseOptions = {}): ParseLengthResult {
  return evaluate(text, "length", options) as ParseLengthResult;
}

/**
 * Reads an area in square feet; a plain number is square feet and `a x b` is two sides in feet.
 *
 * @example
 * parseAreaSqFt("30 x 40 + 12 x 20") // { ok: true, kind: "area", valueSqFt: 1440, understood: "30 ft × 40 ft + 12 ft × 20 ft = 1,440 sq ft" }
 * parseAreaSqFt("120 m2") // valueSqFt ≈ 1,291.67 (120 ÷ 0.09290304)
 */
export function parseAreaSqFt(text: string, options: ParseOptions = {}): ParseAreaResult {
  return evaluate(text, "area", options) as ParseAreaResult;
}
