/**
 * Measurement entry as an estimator types it in the attic or copies it off a drawing: `24' 6"`,
 * `17'-9"`, `4'-3 1/2"`, `4′-3½″`, `24 ft 6 in`, `7.5 m`, `750 cm`, `2400 mm`, a plain `24` (feet), a
 * rectangle `26'6" x 40'`, or an area such as `120 m2` or `1200 sq ft`. This file reads all of those
 * without the general math library. Anything with more arithmetic than one "×" (`30 x 40 + 12 x 20`,
 * `17' - 9"`, parentheses) is an expression: it is handed to an {@link ExpressionEvaluator}
 * (`measurement-expression.ts`, built on mathjs) when the caller passes one, and otherwise the answer
 * is {@link NeedsExpressionReader} so a client can load that evaluator on demand (DEVELOPERS.md,
 * Decision "Measurements are read without mathjs").
 *
 * How it stays safe: the text is cut into a small set of known tokens (numbers, unit words,
 * + − × ÷ and parentheses); anything else is refused with a message. Numbers followed by units are
 * then grouped into quantities ("26 ft 6 in" is one length), so an expression only ever sees
 * quantities, plain numbers, the four operators and parentheses.
 *
 * Units use their exact definitions (1 ft = 0.3048 m, NIST SP 811 App. B); the tests check them
 * against convert-units.
 */
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

/** The entry is an expression and no evaluator was passed: load one and read it again. */
export interface NeedsExpressionReader {
  ok: false;
  needsExpressionReader: true;
  message: string;
}

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

export type UnitId = "ft" | "in" | "yd" | "m" | "cm" | "mm" | "ft2" | "in2" | "yd2" | "m2" | "cm2";

interface UnitInfo {
  dim: 1 | 2;
  /** Label used in the `understood` text. */
  label: string;
  /** How many of this unit make one ft (dim 1) or one sq ft (dim 2); a value in ft is value ÷ this. */
  perFt: number;
  /** Rank within its dimension, larger = bigger unit; used to print "24 ft 6 in" without a "+". */
  rank: number;
}

/*
 * Exact definitions (NIST SP 811, 2008, App. B.8: 1 in = 2.54 cm, 1 ft = 0.3048 m, 1 yd = 0.9144 m,
 * hence 12 in = 1 ft and 3 ft = 1 yd). Written here rather than taken from convert-units so the tests
 * can hold the reader against convert-units as an independent check, and so the client does not load
 * that library (which bridges metric and imperial with a rounded 3.28084 ft/m) for six numbers.
 */
export const UNITS: Record<UnitId, UnitInfo> = {
  yd: { dim: 1, label: "yd", perFt: 1 / 3, rank: 5 },
  ft: { dim: 1, label: "ft", perFt: 1, rank: 4 },
  in: { dim: 1, label: "in", perFt: 12, rank: 3 },
  m: { dim: 1, label: "m", perFt: M_PER_FT, rank: 2 },
  cm: { dim: 1, label: "cm", perFt: 30.48, rank: 1 },
  mm: { dim: 1, label: "mm", perFt: 304.8, rank: 0 },
  yd2: { dim: 2, label: "sq yd", perFt: 1 / 9, rank: 4 },
  ft2: { dim: 2, label: "sq ft", perFt: 1, rank: 3 },
  in2: { dim: 2, label: "sq in", perFt: 144, rank: 2 },
  m2: { dim: 2, label: "m²", perFt: SQ_M_PER_SQ_FT, rank: 1 },
  cm2: { dim: 2, label: "cm²", perFt: 929.0304, rank: 0 },
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

/** A token, with whether whitespace came before it (a spaced minus subtracts, `17'-9"` joins). */
type Token = (
  | { t: "num"; value: number; text: string }
  | { t: "unit"; unit: UnitId }
  | { t: "op"; op: Operator }
  | { t: "paren"; p: "(" | ")" }
) & { isSpaced: boolean };

export type Operator = "+" | "-" | "*" | "/";

/**
 * What an expression is made of once numbers and their units are grouped: a quantity (a length or
 * an area, already in ft or sq ft), a plain number, an operator, a parenthesis, or a unit that
 * applies to the parenthesised group before it (`(20 + 10) ft`).
 */
export type MeasurementItem =
  | { t: "quantity"; quantity: Dimensioned }
  | { t: "num"; value: number; text: string }
  | { t: "op"; op: Operator }
  | { t: "paren"; p: "(" | ")" }
  | { t: "unit"; unit: UnitId };

/** A value while reading: dim 0 = plain number, 1 = length (ft), 2 = area (sq ft). */
export interface Dimensioned {
  value: number;
  dim: 0 | 1 | 2;
  /** A plain number with no unit of its own, whose unit is decided by context. */
  isBare: boolean;
  text: string;
  /** Set when this value is exactly number × one unit, for "24 ft 6 in" printing. */
  unit?: UnitId;
  /** An area made by "a x b" of plain numbers, not yet wrapped in parentheses. */
  isBareProduct?: boolean;
}

/**
 * Reads an expression (more than one operator, or parentheses). `expression` is canonical math
 * text made only of numbers, `q0`, `q1`, … (the grouped `quantities`), `u_ft`-style unit symbols
 * multiplying a parenthesised group, the four operators and parentheses.
 */
export type ExpressionEvaluator = (expression: string, quantities: readonly Dimensioned[], notes: string[]) => Dimensioned;

/** A refusal with a message for the estimator; thrown inside the reader, returned as `ok: false`. */
export class MeasurementError extends Error {}

const NUMBER_RE = /^(?:\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d*)?|\.\d+)/;
const MAX_NUMBER_DIGITS = 9;
/** Vulgar fractions ¼ ½ ¾ (U+00BC–U+00BE) and ⅐ … ⅞ (U+2150–U+215E), Unicode "Number Forms". */
const FRACTION_GLYPH_RE = /[\u00BC-\u00BE\u2150-\u215E]/g;

function normalize(text: string): string {
  return (
    text
      // "3½" is 3 1/2: NFKC spells each glyph as digits around a fraction slash (½ → 1⁄2).
      .replace(FRACTION_GLYPH_RE, (glyph) => ` ${glyph.normalize("NFKC")}`)
      .replace(/\u2044/g, "/") // fraction slash
      .toLowerCase()
      .replace(/[\u2018\u2019\u2032\u02B9]/g, "'") // ‘ ’ ′ ʹ → foot mark
      .replace(/[\u201C\u201D\u2033\u02BA]/g, '"') // “ ” ″ ʺ → inch mark
      .replace(/''/g, '"') // two foot marks typed as an inch mark
      .replace(/[\u00D7\u2715\u2716]/g, " x ") // × ✕ ✖
      .replace(/\u00F7/g, "/")
      .replace(/[\u2212\u2013\u2010\u2011]/g, "-") // minus sign, en dash, hyphens
      .trim()
  );
}

function tokenize(text: string): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  let isSpaced = false;
  while (i < text.length) {
    const rest = text.slice(i);
    const ch = text[i]!;
    if (/\s/.test(ch)) {
      i += 1;
      isSpaced = true;
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
      tokens.push({ t: "num", value, text: raw, isSpaced });
      i += raw.length;
      isSpaced = false;
      if (text[i] === ",") {
        throw new MeasurementError(
          `I could not read "${raw}${text.slice(i, i + 3)}": use a point for decimals (7.5) and commas only for thousands (1,200).`,
        );
      }
      continue;
    }
    if ("+-*/()".includes(ch)) {
      if (ch === "(" || ch === ")") tokens.push({ t: "paren", p: ch, isSpaced });
      else tokens.push({ t: "op", op: ch as Operator, isSpaced });
      i += 1;
      isSpaced = false;
      continue;
    }
    // "x" and "by" mean "times" between two dimensions.
    if (/^(?:x|by)(?![a-z])/.test(rest)) {
      tokens.push({ t: "op", op: "*", isSpaced });
      i += rest.startsWith("by") ? 2 : 1;
      isSpaced = false;
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
      tokens.push({ t: "unit", unit: alias[1], isSpaced });
      i += alias[0].length;
      isSpaced = false;
      continue;
    }
    const word = /^[a-z]+/.exec(rest)?.[0] ?? ch;
    throw new MeasurementError(
      `I don't understand "${word}". Use numbers with ft, in, ' or ", m, cm, mm, sq ft or m², and + or × (for example 24' 6", 7.5 m or 30 x 40 + 12 x 20).`,
    );
  }
  return tokens;
}

const isOp = (token: Token | undefined, op: Operator): boolean => token?.t === "op" && token.op === op;

/** A dash written tight against at least one neighbour (`17'-9"`, `3-1/2`), not a spaced minus. */
const isJoiningDash = (tokens: readonly Token[], k: number): boolean =>
  isOp(tokens[k], "-") && !(tokens[k]!.isSpaced && tokens[k + 1]?.isSpaced === true);

/**
 * One number at `k`: a whole or decimal number, a fraction `1/2` (which binds tighter than a unit:
 * 1/2" is half an inch), or a mixed number `6 1/2` or `6-1/2` (the dash form of lumber and trim
 * sizes; common practice). Returns the value and the index after it.
 */
function readNumber(tokens: readonly Token[], k: number): { value: number; text: string; next: number } {
  const whole = tokens[k] as Extract<Token, { t: "num" }>;
  const fractionAt = (at: number): { value: number; next: number } | null => {
    const numerator = tokens[at];
    const denominator = tokens[at + 2];
    if (numerator?.t !== "num" || !isOp(tokens[at + 1], "/") || denominator?.t !== "num") return null;
    if (denominator.value === 0) throw new MeasurementError("Can't divide by zero.");
    return { value: numerator.value / denominator.value, next: at + 3 };
  };
  const divided = isOp(tokens[k - 1], "/");
  // "6 1/2": two numbers in a row where the second is a fraction.
  const spacedFraction = fractionAt(k + 1);
  if (spacedFraction) return { value: whole.value + spacedFraction.value, text: String(whole.value + spacedFraction.value), next: spacedFraction.next };
  // "6-1/2": a proper fraction joined by a dash.
  if (isJoiningDash(tokens, k + 1)) {
    const dashedFraction = fractionAt(k + 2);
    if (dashedFraction && dashedFraction.value < 1) {
      return { value: whole.value + dashedFraction.value, text: String(whole.value + dashedFraction.value), next: dashedFraction.next };
    }
  }
  // "1/2" alone (not the divisor of an earlier "/").
  const simple = divided ? null : fractionAt(k);
  if (simple) return { value: simple.value, text: String(simple.value), next: simple.next };
  return { value: whole.value, text: String(whole.value), next: k + 1 };
}

interface Term {
  value: number;
  text: string;
  unit: UnitId;
}

function quantityOf(terms: readonly Term[]): Dimensioned {
  const first = terms[0]!;
  const firstInfo = UNITS[first.unit];
  if (terms.length === 1) {
    return { value: first.value / firstInfo.perFt, dim: firstInfo.dim, isBare: false, text: `${first.text} ${firstInfo.label}`, unit: first.unit };
  }
  let value = 0;
  let text = "";
  terms.forEach((term, index) => {
    const info = UNITS[term.unit];
    value += term.value / info.perFt;
    const termText = `${term.text} ${info.label}`;
    // "24 ft 6 in" when the units descend as on a tape; otherwise the sum is spelled out.
    const isDescending = index > 0 && UNITS[terms[index - 1]!.unit].rank > info.rank;
    text = index === 0 ? termText : `${text}${isDescending ? " " : " + "}${termText}`;
  });
  return { value, dim: firstInfo.dim, isBare: false, text };
}

/**
 * Groups numbers with their units. Several terms with no operator between them are one quantity
 * ("24 ft 6 in", "1 m 20 cm"); a bare number right after feet is inches, as a tape is read
 * ("24' 6"); and a dash right after feet, before inches, joins them as on drawings ("17'-9"",
 * "4'-3 1/2""; common practice in US architectural dimensioning). A spaced minus (`17' - 9"`) and
 * feet minus feet (`20'-5'`) stay subtractions.
 */
function groupQuantities(tokens: readonly Token[], notes: string[]): MeasurementItem[] {
  const items: MeasurementItem[] = [];
  let k = 0;
  while (k < tokens.length) {
    const token = tokens[k]!;
    if (token.t !== "num") {
      if (token.t === "op") items.push({ t: "op", op: token.op });
      else if (token.t === "paren") items.push({ t: "paren", p: token.p });
      else items.push({ t: "unit", unit: token.unit });
      k += 1;
      continue;
    }
    const first = readNumber(tokens, k);
    const firstUnit = tokens[first.next];
    if (firstUnit?.t !== "unit") {
      items.push({ t: "num", value: first.value, text: first.text });
      k = first.next;
      continue;
    }
    const terms: Term[] = [{ value: first.value, text: first.text, unit: firstUnit.unit }];
    k = first.next + 1;
    for (;;) {
      const last = terms[terms.length - 1]!;
      const isDashAfterFeet = last.unit === "ft" && isJoiningDash(tokens, k) && tokens[k + 1]?.t === "num";
      const at = isDashAfterFeet ? k + 1 : k;
      if (tokens[at]?.t !== "num") break;
      const next = readNumber(tokens, at);
      const unitToken = tokens[next.next];
      if (unitToken?.t === "unit") {
        // A dash before anything but inches is a minus ("20'-5'" is 15 ft).
        if (isDashAfterFeet && unitToken.unit !== "in") break;
        if (UNITS[unitToken.unit].dim !== UNITS[last.unit].dim) {
          throw new MeasurementError(`Put + or x between "${last.text} ${UNITS[last.unit].label}" and "${next.text} ${UNITS[unitToken.unit].label}".`);
        }
        terms.push({ value: next.value, text: next.text, unit: unitToken.unit });
        k = next.next + 1;
        continue;
      }
      if (last.unit === "ft") {
        terms.push({ value: next.value, text: next.text, unit: "in" });
        notes.push("a number after feet is read as inches");
        k = next.next;
        continue;
      }
      throw new MeasurementError(`Add a unit after "${next.text}", or + or x before it.`);
    }
    items.push({ t: "quantity", quantity: quantityOf(terms) });
  }
  return items;
}

function asFeet(v: Dimensioned): Dimensioned {
  return { value: v.value, dim: 1, isBare: false, text: `${v.text} ft`, unit: "ft" };
}

function asSqFt(v: Dimensioned): Dimensioned {
  return { value: v.value, dim: 2, isBare: false, text: `${v.text} sq ft`, unit: "ft2" };
}

/** A plain number on its own: its text as it prints in `understood`. */
export function plainNumber(value: number): Dimensioned {
  return { value, dim: 0, isBare: true, text: formatNumber(value, { maxFractionDigits: 4 }) };
}

/** A plain number (or parenthesised plain sum) followed by a unit: `(20 + 10) ft`. */
export function withUnit(value: Dimensioned, unit: UnitId): Dimensioned {
  const info = UNITS[unit];
  if (value.dim !== 0) throw new MeasurementError(`"${info.label}" can only follow a plain number.`);
  return { value: value.value / info.perFt, dim: info.dim, isBare: false, text: `${value.text} ${info.label}`, unit };
}

/** `a + b` or `a − b`; a plain number beside a measurement takes that measurement's default unit. */
export function addOrSubtract(left: Dimensioned, right: Dimensioned, isAdd: boolean, notes: string[]): Dimensioned {
  let a = left;
  let b = right;
  if (a.dim !== b.dim) {
    const promote = (v: Dimensioned, dim: 1 | 2) => (dim === 1 ? asFeet(v) : asSqFt(v));
    if (a.isBare && a.dim === 0 && b.dim > 0) a = promote(a, b.dim as 1 | 2);
    else if (b.isBare && b.dim === 0 && a.dim > 0) b = promote(b, a.dim as 1 | 2);
    else throw new MeasurementError("Can't add a length to an area.");
    notes.push(`a plain number beside a measurement is read as ${a.dim === 2 ? "sq ft" : "ft"}`);
  }
  const unitsDescend = isAdd && a.unit && b.unit && UNITS[a.unit].dim === 1 && UNITS[a.unit].rank > UNITS[b.unit].rank;
  const text = isAdd ? (unitsDescend ? `${a.text} ${b.text}` : `${a.text} + ${b.text}`) : `${a.text} − ${b.text}`;
  return { value: isAdd ? a.value + b.value : a.value - b.value, dim: a.dim, isBare: a.isBare && b.isBare, text };
}

/** `a × b`: two plain numbers are two sides in feet; a plain number times an area is a count. */
export function multiply(left: Dimensioned, right: Dimensioned, notes: string[]): Dimensioned {
  let a = left;
  let b = right;
  if ((a.isBareProduct && b.isBare) || (b.isBareProduct && a.isBare)) {
    // "2 x 30 x 40" could be two 30 x 40 areas or a volume: ask for parentheses.
    throw new MeasurementError("Three plain numbers multiplied is ambiguous: for a count of areas write 2 x (30 x 40).");
  }
  const isBareProduct = a.isBare && b.isBare;
  if (a.isBare && b.isBare) {
    a = asFeet(a);
    b = asFeet(b);
  } else if (a.isBare && b.dim === 1) a = asFeet(a);
  else if (b.isBare && a.dim === 1) b = asFeet(b);
  const dim = a.dim + b.dim;
  if (dim > 2) throw new MeasurementError("That multiplies too many lengths (a length × a length is already an area).");
  if (isBareProduct) notes.push("plain numbers are read as feet");
  return { value: a.value * b.value, dim: dim as 0 | 1 | 2, isBare: false, text: `${a.text} × ${b.text}`, isBareProduct };
}

/** `a / n`: only by a plain number. */
export function divide(left: Dimensioned, right: Dimensioned): Dimensioned {
  if (right.dim !== 0) throw new MeasurementError("You can only divide by a plain number.");
  if (right.value === 0) throw new MeasurementError("Can't divide by zero.");
  return { value: left.value / right.value, dim: left.dim, isBare: left.isBare, text: `${left.text}/${right.text}` };
}

const operand = (item: MeasurementItem | undefined): Dimensioned | null =>
  item?.t === "quantity" ? item.quantity : item?.t === "num" ? plainNumber(item.value) : null;

/**
 * The plain shapes read here without an expression evaluator: one quantity or number, or two of
 * them multiplied (a rectangle, or a count of an area). Returns null for anything else.
 */
function readPlain(items: readonly MeasurementItem[], notes: string[]): Dimensioned | null {
  if (items.length === 1) return operand(items[0]);
  if (items.length === 3 && items[1]!.t === "op" && items[1]!.op === "*") {
    const left = operand(items[0]);
    const right = operand(items[2]);
    if (left && right) return multiply(left, right, notes);
  }
  return null;
}

/**
 * Turns items into canonical math text, refusing misplaced operators and units with a message.
 * A quantity becomes a symbol `q<k>`, so `26'6" x 40'` keeps its feet and inches together.
 */
function toCanonical(items: readonly MeasurementItem[]): { expression: string; quantities: Dimensioned[] } {
  const parts: string[] = [];
  const quantities: Dimensioned[] = [];
  let prev: "start" | "op" | "open" | "close" | "num" | "quantity" = "start";
  let depth = 0;
  for (const item of items) {
    switch (item.t) {
      case "num":
      case "quantity": {
        if (prev === "num" || prev === "close" || (prev === "quantity" && item.t === "num")) {
          const text = item.t === "num" ? item.text : item.quantity.text;
          throw new MeasurementError(`Two numbers in a row ("${text}"): put a unit after each number, or + or x between them.`);
        }
        // "(20 + 10) ft 6 in": a quantity right after a unit-carrying group adds to it.
        if (prev === "quantity") parts.push("+");
        if (item.t === "num") {
          parts.push(String(item.value));
          prev = "num";
        } else {
          parts.push(`q${quantities.length}`);
          quantities.push(item.quantity);
          prev = "quantity";
        }
        break;
      }
      case "unit": {
        if (prev !== "close") throw new MeasurementError("A unit needs a number before it (for example 24 ft).");
        // A unit after ")" applies to the whole group.
        let level = 0;
        let start = parts.length - 1;
        for (; start >= 0; start -= 1) {
          if (parts[start] === ")") level += 1;
          if (parts[start] === "(") level -= 1;
          if (level === 0) break;
        }
        const group = parts.splice(start).join(" ");
        parts.push(`(${group} * u_${item.unit})`);
        prev = "quantity";
        break;
      }
      case "op": {
        if (prev === "start" || prev === "op" || prev === "open") {
          if (item.op === "-") throw new MeasurementError("A measurement can't be negative.");
          throw new MeasurementError(`"${item.op === "*" ? "x" : item.op}" needs a measurement before it.`);
        }
        parts.push(item.op);
        prev = "op";
        break;
      }
      case "paren": {
        if (item.p === "(") {
          if (prev === "quantity") parts.push("+");
          else if (prev === "num" || prev === "close") throw new MeasurementError('Put + or x before "(".');
          parts.push("(");
          depth += 1;
          prev = "open";
        } else {
          if (prev === "op" || prev === "open" || prev === "start" || depth === 0) {
            throw new MeasurementError(depth === 0 ? "Check the parentheses and operators in that entry." : 'Something is missing before ")".');
          }
          parts.push(")");
          depth -= 1;
          prev = "close";
        }
        break;
      }
    }
  }
  if (prev === "op") throw new MeasurementError("The entry ends with an operator; finish the measurement.");
  if (depth !== 0) throw new MeasurementError("Check the parentheses and operators in that entry.");
  return { expression: parts.join(" "), quantities };
}

export type Wanted = "length" | "area" | "either";

function finish(read: Dimensioned, wanted: Wanted, options: ParseOptions, notes: string[]): ParseMeasurementResult {
  let result = read;
  if (result.dim === 0) {
    result = wanted === "area" ? asSqFt(result) : asFeet(result);
    notes.push(`a plain number is read as ${wanted === "area" ? "sq ft" : "feet"}`);
  }
  if (!Number.isFinite(result.value)) return { ok: false, message: "That measurement is not a usable number." };
  if (result.value < 0) return { ok: false, message: "A measurement can't be negative." };
  if (result.value === 0 && !options.allowZero) return { ok: false, message: "A measurement must be more than zero." };
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
}

/**
 * Reads a length, an area or either. Never throws. Plain entries are read here; an expression is
 * read by `evaluateExpression` when given, and otherwise answers {@link NeedsExpressionReader}.
 *
 * @example
 * readMeasurement(`17'-9"`, "length", {}) // { ok: true, kind: "length", valueFt: 17.75, understood: "17 ft 9 in = 17.75 ft" }
 * readMeasurement("30 x 40 + 12 x 20", "area", {}) // { ok: false, needsExpressionReader: true, ... }
 */
export function readMeasurement(text: unknown, wanted: Wanted, options: ParseOptions, evaluateExpression: ExpressionEvaluator): ParseMeasurementResult;
export function readMeasurement(
  text: unknown,
  wanted: Wanted,
  options: ParseOptions,
  evaluateExpression?: ExpressionEvaluator,
): ParseMeasurementResult | NeedsExpressionReader;
export function readMeasurement(
  text: unknown,
  wanted: Wanted,
  options: ParseOptions,
  evaluateExpression?: ExpressionEvaluator,
): ParseMeasurementResult | NeedsExpressionReader {
  try {
    if (typeof text !== "string") return { ok: false, message: "Enter a measurement." };
    const normalized = normalize(text);
    if (normalized === "") return { ok: false, message: "Enter a measurement." };
    if (normalized.length > MAX_MEASUREMENT_CHARS) {
      return { ok: false, message: `That entry is too long (over ${MAX_MEASUREMENT_CHARS} characters).` };
    }
    const notes: string[] = [];
    const items = groupQuantities(tokenize(normalized), notes);
    const plain = readPlain(items, notes);
    if (plain) return finish(plain, wanted, options, notes);
    // Checked before any evaluator loads, so a mistyped entry is answered at once.
    const { expression, quantities } = toCanonical(items);
    if (!evaluateExpression) {
      return { ok: false, needsExpressionReader: true, message: "Reading the expression…" };
    }
    return finish(evaluateExpression(expression, quantities, notes), wanted, options, notes);
  } catch (error) {
    if (error instanceof MeasurementError) return { ok: false, message: error.message };
    return { ok: false, message: "I could not read that measurement." };
  }
}

/**
 * Reads a length in feet (a plain number is feet); see {@link readMeasurement}.
 *
 * @example
 * readLengthFt(`4'-3 1/2"`, {}) // { ok: true, kind: "length", valueFt: 4.2916…, understood: "4 ft 3.5 in = 4.29 ft" }
 */
export function readLengthFt(text: unknown, options: ParseOptions, evaluateExpression?: ExpressionEvaluator): ParseLengthResult | NeedsExpressionReader {
  return readMeasurement(text, "length", options, evaluateExpression) as ParseLengthResult | NeedsExpressionReader;
}

/**
 * Reads an area in sq ft (a plain number is sq ft, `a x b` two sides in feet); see {@link readMeasurement}.
 *
 * @example
 * readAreaSqFt(`26'6" x 40'`, {}) // { ok: true, kind: "area", valueSqFt: 1060, understood: "26 ft 6 in × 40 ft = 1,060 sq ft" }
 */
export function readAreaSqFt(text: unknown, options: ParseOptions, evaluateExpression?: ExpressionEvaluator): ParseAreaResult | NeedsExpressionReader {
  return readMeasurement(text, "area", options, evaluateExpression) as ParseAreaResult | NeedsExpressionReader;
}
