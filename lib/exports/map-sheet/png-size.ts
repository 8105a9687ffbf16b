/** Width and height of a PNG from its IHDR chunk (PNG spec §11.2.2), or null when the bytes are not a PNG. */
export function pngSize(bytes: Uint8Array): { widthPx: number; heightPx: number } | null {
  const signature = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
  if (bytes.length < 24 || signature.some((b, i) => bytes[i] !== b)) return null;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  // After the signature: IHDR length (4), "IHDR" (4), width (4, big-endian), height (4).
  if (String.fromCharCode(...bytes.subarray(12, 16)) !== "IHDR") return null;
  return { widthPx: view.getUint32(16), heightPx: view.getUint32(20) };
}
