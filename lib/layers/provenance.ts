/** The "how it was made" line for a layer picture: which layer version, from which file, by whom, when. */
export function layerProvenance(version: { name: string; number: number; sourceFile: string; author: string | null; createdAt: Date }): string {
  const by = version.author ? ` by ${version.author}` : "";
  const file = version.sourceFile ? ` from ${version.sourceFile}` : "";
  return `Layer "${version.name}" version ${version.number}${file}, uploaded${by} on ${version.createdAt.toISOString().slice(0, 10)}. Grid cells and points are thinned for drawing; the stored layer keeps every one.`;
}
