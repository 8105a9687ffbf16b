/**
 * Where a JSON text first goes wrong (RFC 8259 grammar), because Node 20's JSON.parse messages
 * do not say. Returns the character offset of the first offending character, or −1 when the text
 * is valid.
 */
export function jsonErrorOffset(text: string): number {
  let i = 0;
  const fail = (): never => {
    throw i;
  };
  const space = () => {
    while (i < text.length && " \t\n\r".includes(text[i])) i++;
  };
  const literal = (word: string) => {
    for (const ch of word) {
      if (text[i] !== ch) fail();
      i++;
    }
  };
  const string = () => {
    i++;
    while (i < text.length && text[i] !== '"') {
      if (text.charCodeAt(i) < 0x20) fail();
      if (text[i] === "\\") {
        i++;
        if (text[i] === "u") {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 1, i + 5))) fail();
          i += 4;
        } else if (!'"\\/bfnrt'.includes(text[i] ?? "")) fail();
      }
      i++;
    }
    if (i >= text.length) fail();
    i++;
  };
  const number = () => {
    const match = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(text.slice(i));
    if (!match) fail();
    i += match![0].length;
  };
  const value = (): void => {
    space();
    const ch = text[i];
    if (ch === "{") {
      i++;
      space();
      if (text[i] === "}") return void i++;
      for (;;) {
        space();
        if (text[i] !== '"') fail();
        string();
        space();
        if (text[i] !== ":") fail();
        i++;
        value();
        space();
        if (text[i] === ",") i++;
        else if (text[i] === "}") return void i++;
        else fail();
      }
    }
    if (ch === "[") {
      i++;
      space();
      if (text[i] === "]") return void i++;
      for (;;) {
        value();
        space();
        if (text[i] === ",") i++;
        else if (text[i] === "]") return void i++;
        else fail();
      }
    }
    if (ch === '"') return string();
    if (ch === "t") return literal("true");
    if (ch === "f") return literal("false");
    if (ch === "n") return literal("null");
    if (ch === "-" || (ch >= "0" && ch <= "9")) return number();
    fail();
  };
  try {
    value();
    space();
    return i < text.length ? i : -1;
  } catch (offset) {
    return offset as number;
  }
}
