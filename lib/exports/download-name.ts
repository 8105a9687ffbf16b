/** A file name for an export: ASCII, lower case, `leeway-<scenario>-v<version>-<what>.<ext>`. */
export function downloadName(scenarioName: string, versionNumber: number, what: string, extension: string): string {
  const slug =
    scenarioName
      .normalize("NFKD")
      .replace(/[\u0300-\u036f]/g, "")
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-+|-+$/g, "")
      .slice(0, 60) || "scenario";
  return `leeway-${slug}-v${versionNumber}-${what}.${extension}`;
}
