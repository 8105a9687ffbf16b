/**
 * Text for PDF pages drawn in an embedded font: characters the font lacks (Source Sans 3's latin
 * subset has no "≤" or "≥") are spelled out instead of showing as empty boxes, and long text is
 * wrapped to a width.
 */

/** What the layout needs from a font: its width of a text at a size, pt, and the code points it has. */
export interface MeasuredFont {
  widthOfTextAtSize(text: string, size: number): number;
  getCharacterSet(): number[];
}

const SPELLED_OUT: Record<string, string> = {
  "≤": "<=",
  "≥": ">=",
  "→": "->",
  "←": "<-",
  "≈": "~",
  "−": "-",
  "′": "'",
  "″": '"',
  "²": "2",
};

/** `text` with every character the font lacks replaced by a spelling it has ("?" as a last resort). */
export function fontSafeText(font: MeasuredFont, text: string): string {
  const has = new Set(font.getCharacterSet());
  let out = "";
  for (const char of text) {
    const code = char.codePointAt(0) ?? 0;
    if (has.has(code) || char === " ") out += char;
    else if (SPELLED_OUT[char] && [...SPELLED_OUT[char]].every((c) => has.has(c.codePointAt(0) ?? 0))) out += SPELLED_OUT[char];
    else out += "?";
  }
  return out;
}

/** Breaks `text` into lines no wider than `maxWidthPt` at `sizePt`, at spaces (a word longer than the width gets a line of its own). */
export function wrapText(font: MeasuredFont, text: string, sizePt: number, maxWidthPt: number): string[] {
  const lines: string[] = [];
  for (const paragraph of text.split("\n")) {
    let line = "";
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      const candidate = line ? `${line} ${word}` : word;
      if (line && font.widthOfTextAtSize(candidate, sizePt) > maxWidthPt) {
        lines.push(line);
        line = word;
      } else line = candidate;
    }
    lines.push(line);
  }
  return lines;
}
