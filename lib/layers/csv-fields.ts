import { z } from "zod";

/** A plain decimal number as written in a CSV cell: optional sign, digits, one decimal point, optional exponent. */
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
/** "12,5" or "-0,25": a number written with a decimal comma. */
const DECIMAL_COMMA = /^[+-]?\d+,\d+$/;

function quoted(text: string): string {
  return text.length > 24 ? `"${text.slice(0, 24)}…"` : `"${text}"`;
}

/**
 * A CSV cell that must hold a number. The message tells a decimal comma apart from text,
 * because the fix differs (Leeway reads decimal points only).
 */
export const numberCell = z.string().transform((raw, ctx) => {
  const text = raw.trim();
  if (text === "") {
    ctx.addIssue({ code: "custom", message: "is empty; a number is needed" });
    return z.NEVER;
  }
  if (DECIMAL.test(text)) return Number(text);
  if (DECIMAL_COMMA.test(text)) {
    ctx.addIssue({ code: "custom", message: `${quoted(text)} uses a decimal comma; write it with a decimal point (${text.replace(",", ".")})` });
  } else {
    ctx.addIssue({ code: "custom", message: `${quoted(text)} is not a number` });
  }
  return z.NEVER;
});

/** Longitude in degrees east, −180 to 180. */
export const lonCell = numberCell.pipe(z.number().min(-180, "must be between -180 and 180 degrees").max(180, "must be between -180 and 180 degrees"));

/** Latitude in degrees north, −90 to 90. */
export const latCell = numberCell.pipe(z.number().min(-90, "must be between -90 and 90 degrees").max(90, "must be between -90 and 90 degrees"));

/** A name-like text cell: trimmed, not empty, at most `maxLength` characters. */
export function textCell(what: string, maxLength: number) {
  return z
    .string()
    .transform((raw) => raw.trim())
    .pipe(z.string().min(1, `is empty; a ${what} is needed`).max(maxLength, `is longer than ${maxLength} characters`));
}

const TRUE_WORDS = new Set(["true", "yes", "y", "1"]);
const FALSE_WORDS = new Set(["false", "no", "n", "0"]);

/** A yes/no cell (true/false, yes/no, 1/0, any case); empty means `emptyMeans`. */
export function booleanCell(emptyMeans: boolean) {
  return z.string().transform((raw, ctx) => {
    const text = raw.trim().toLowerCase();
    if (text === "") return emptyMeans;
    if (TRUE_WORDS.has(text)) return true;
    if (FALSE_WORDS.has(text)) return false;
    ctx.addIssue({ code: "custom", message: `${quoted(raw.trim())} is not one of true/false, yes/no, 1/0` });
    return z.NEVER;
  });
}
