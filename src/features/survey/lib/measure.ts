import { formatAreaSqFt, formatFeetInches, formatNumber, ftToM, sqFtToSqM, type UnitSystem } from "@shared/units/format";
import { readAreaSqFt, readLengthFt, type ExpressionEvaluator, type NeedsExpressionReader } from "@shared/units/read-measurement";

/*
 * Plain entries (`17'-9"`, `5.2 m`, `26'6" x 40'`) are read at once without the math library; an
 * expression (`12 x 30 + 8 x 10`) loads the expression reader (mathjs) as its own chunk the first
 * time one is typed. Meanwhile the entry is pending and `EntryField` reads it again once the reader
 * is here (DEVELOPERS.md, Decision "Measurements are read without mathjs").
 */
let expressionReader: ExpressionEvaluator | undefined;
let expressionReaderLoad: Promise<void> | undefined;
let hasExpressionReaderFailed = false;

/** Loads the expression reader once; a failed load (offline) is tried again on the next call. */
export function loadExpressionReader(): Promise<void> {
  expressionReaderLoad ??= import("@shared/units/measurement-expression").then(
    (module) => {
      expressionReader = module.evaluateExpression;
      hasExpressionReaderFailed = false;
    },
    () => {
      hasExpressionReaderFailed = true;
      expressionReaderLoad = undefined;
    },
  );
  return expressionReaderLoad;
}

const EXPRESSION_READER_FAILED =
  "Sums and products need a part of the app that didn't load (no connection?). Enter a single measurement, or type again to retry.";

/** Reads with whatever reader is here; an expression starts loading the expression reader. */
function read<Result extends { ok: boolean }>(
  readWith: (evaluateExpression: ExpressionEvaluator | undefined) => Result | NeedsExpressionReader,
): Result | NeedsExpressionReader | { ok: false; message: string } {
  const parsed = readWith(expressionReader);
  if (!parsed.ok && "needsExpressionReader" in parsed) {
    if (hasExpressionReaderFailed) {
      hasExpressionReaderFailed = false;
      return { ok: false, message: EXPRESSION_READER_FAILED };
    }
    void loadExpressionReader();
  }
  return parsed;
}

const pendingEntry = (text: string): EntryDraft => ({ text, value: null, error: null, understood: null, isPending: true });

/**
 * One typed entry: the text exactly as typed (never thrown away), the value understood from it
 * (feet, sq ft, inches or a plain number, as the field says), and the reason when it can't be read.
 */
export interface EntryDraft {
  text: string;
  value: number | null;
  error: string | null;
  /** What the parser understood, shown under the field, e.g. "24 ft 6 in = 24.5 ft". */
  understood: string | null;
  /** An expression waiting for the expression reader to load; read again when it has. */
  isPending?: boolean;
}

export const emptyEntry = (): EntryDraft => ({ text: "", value: null, error: null, understood: null });

/** A length in feet; a plain number is feet. */
export function lengthEntry(text: string, options: { allowZero?: boolean; system?: UnitSystem } = {}): EntryDraft {
  if (text.trim() === "") return { text, value: null, error: null, understood: null };
  const parsed = read((reader) => readLengthFt(text, { allowZero: options.allowZero }, reader));
  if (!parsed.ok) return "needsExpressionReader" in parsed ? pendingEntry(text) : { text, value: null, error: parsed.message, understood: null };
  const metric = options.system === "metric" && !/m\b/i.test(text) ? ` (${formatNumber(ftToM(parsed.valueFt))} m)` : "";
  return { text, value: parsed.valueFt, error: null, understood: `${parsed.understood}${metric}` };
}

/** An area in sq ft; `a x b` is two sides in feet. */
export function areaEntry(text: string, system?: UnitSystem): EntryDraft {
  if (text.trim() === "") return { text, value: null, error: null, understood: null };
  const parsed = read((reader) => readAreaSqFt(text, {}, reader));
  if (!parsed.ok) return "needsExpressionReader" in parsed ? pendingEntry(text) : { text, value: null, error: parsed.message, understood: null };
  const metric = system === "metric" && !/m(2|²|\^2)/i.test(text) ? ` (${formatNumber(sqFtToSqM(parsed.valueSqFt))} m²)` : "";
  return { text, value: parsed.valueSqFt, error: null, understood: `${parsed.understood}${metric}` };
}

const BARE_NUMBER = /^\s*\d[\d,]*(\.\d*)?\s*$|^\s*\.\d+\s*$/;

/** A small size in inches (a louver's opening); a plain number is inches here, not feet. */
export function inchEntry(text: string): EntryDraft {
  if (text.trim() === "") return { text, value: null, error: null, understood: null };
  const parsed = read((reader) => readLengthFt(BARE_NUMBER.test(text) ? `${text} in` : text, {}, reader));
  if (!parsed.ok) return "needsExpressionReader" in parsed ? pendingEntry(text) : { text, value: null, error: parsed.message, understood: null };
  const valueIn = parsed.valueFt * 12;
  return { text, value: valueIn, error: null, understood: `${formatNumber(valueIn, { maxFractionDigits: 2 })} in (${formatNumber(valueIn * 2.54, { maxFractionDigits: 1 })} cm)` };
}

/** A plain number (a count, NFA from a label, cfm, volts), with optional whole-number and range checks. */
export function numberEntry(
  text: string,
  options: { isWhole?: boolean; min?: number; max?: number; unit?: string; allowZero?: boolean } = {},
): EntryDraft {
  const trimmed = text.trim().replace(/,/g, "");
  if (trimmed === "") return { text, value: null, error: null, understood: null };
  const value = Number(trimmed);
  if (!/^-?\d*\.?\d+$|^-?\d+\.$/.test(trimmed) || !Number.isFinite(value)) {
    return { text, value: null, error: `Enter a number${options.unit ? ` of ${options.unit}` : ""}, for example ${options.isWhole ? "4" : "18"}.`, understood: null };
  }
  if (options.isWhole && !Number.isInteger(value)) return { text, value: null, error: "Use a whole number.", understood: null };
  if (options.min !== undefined ? value < options.min : options.allowZero ? value < 0 : value <= 0) {
    const message = options.min !== undefined ? `Use at least ${formatNumber(options.min)}.` : options.allowZero ? "It can't be negative." : "Use a number more than 0.";
    return { text, value: null, error: message, understood: null };
  }
  if (options.max !== undefined && value > options.max) {
    return { text, value: null, error: `Use at most ${formatNumber(options.max)}.`, understood: null };
  }
  return { text, value, error: null, understood: null };
}

/** The text a stored length is shown as when the form opens: feet and inches, or metres. */
export function lengthText(valueFt: number, system: UnitSystem): string {
  if (valueFt === 0) return system === "metric" ? "0 m" : "0 ft";
  if (system === "metric") return `${formatNumber(ftToM(valueFt), { maxFractionDigits: 3 })} m`;
  return formatFeetInches(valueFt, 16);
}

/** Starts a field from a stored value: the value is kept exactly, the text is only for show. */
export function entryFromLength(valueFt: number | null | undefined, system: UnitSystem, options: { allowZero?: boolean } = {}): EntryDraft {
  if (valueFt === null || valueFt === undefined) return emptyEntry();
  const text = lengthText(valueFt, system);
  const understood = lengthEntry(text, { ...options, system }).understood;
  return { text, value: valueFt, error: null, understood };
}

export function entryFromArea(valueSqFt: number | null | undefined, system: UnitSystem): EntryDraft {
  if (valueSqFt === null || valueSqFt === undefined) return emptyEntry();
  const text = formatAreaSqFt(valueSqFt, system).replace("m²", "m2");
  return { text, value: valueSqFt, error: null, understood: formatAreaSqFt(valueSqFt, system) };
}

export function entryFromInches(valueIn: number | null | undefined): EntryDraft {
  if (valueIn === null || valueIn === undefined) return emptyEntry();
  const text = `${formatNumber(valueIn, { maxFractionDigits: 3 })}`;
  return { ...inchEntry(text), value: valueIn };
}

export function entryFromNumber(value: number | null | undefined): EntryDraft {
  if (value === null || value === undefined) return emptyEntry();
  return { text: String(value), value, error: null, understood: null };
}
