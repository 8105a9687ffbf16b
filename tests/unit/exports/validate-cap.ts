// Validates a CAP document against tests/fixtures/cap/CAP-v1.2.xsd with xmllint (libxml2 compiled to WebAssembly).
import { readFileSync } from "node:fs";
import path from "node:path";
import { validateXML } from "xmllint-wasm";

const XSD_PATH = path.resolve(__dirname, "../../fixtures/cap/CAP-v1.2.xsd");

/** xmllint's verdict: valid, or the messages it printed. */
export async function validateCap(xml: string): Promise<{ valid: boolean; errors: string[] }> {
  const result = await validateXML({
    xml: [{ fileName: "message.xml", contents: xml }],
    schema: [{ fileName: "CAP-v1.2.xsd", contents: readFileSync(XSD_PATH, "utf8") }],
  });
  return { valid: result.valid, errors: result.errors.map((e) => e.rawMessage) };
}
