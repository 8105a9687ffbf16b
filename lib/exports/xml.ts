/** Text and attribute content escaped for XML 1.0 (§2.4: `<` and `&` never appear literally; quotes for attributes). */
export function escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&apos;");
}
