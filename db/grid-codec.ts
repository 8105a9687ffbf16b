/**
 * Packs grid layers (population, site condition) into the `grid_chunks` BLOB columns and back.
 *
 * Each chunk holds up to `GRID_CHUNK_CELLS` cells as little-endian columns: lon, lat and value as
 * Float64 (8 bytes a cell), district as Int32 (4 bytes a cell, -1 = no district). Bytes are written
 * through a DataView so the stored layout is little-endian whatever the host's byte order.
 */

/** Cells per stored chunk: 65,536 cells is 512 KiB per Float64 column, a comfortable row size for SQLite. */
export const GRID_CHUNK_CELLS = 65_536;

/** The district index stored for a cell outside every district. */
export const NO_DISTRICT = -1;

/** A grid layer held as parallel typed arrays, one entry per cell. */
export interface GridColumns {
  /** Cell centre longitude, degrees. */
  lon: Float64Array;
  /** Cell centre latitude, degrees. */
  lat: Float64Array;
  /** People in the cell, or Vs30 in m/s, depending on the layer kind. */
  value: Float64Array;
  /** Index of the cell's district in the districts layer version, or -1; absent for layers without districts. */
  district?: Int32Array;
}

/** One `grid_chunks` row without its layer version id. */
export interface GridChunk {
  chunk: number;
  count: number;
  lon: Buffer;
  lat: Buffer;
  value: Buffer;
  district: Buffer | null;
}

const FLOAT64_BYTES = 8;
const INT32_BYTES = 4;

function packFloat64(values: Float64Array, start: number, end: number): Buffer {
  const bytes = Buffer.alloc((end - start) * FLOAT64_BYTES);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let i = start; i < end; i++) view.setFloat64((i - start) * FLOAT64_BYTES, values[i], true);
  return bytes;
}

function packInt32(values: Int32Array, start: number, end: number): Buffer {
  const bytes = Buffer.alloc((end - start) * INT32_BYTES);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let i = start; i < end; i++) view.setInt32((i - start) * INT32_BYTES, values[i], true);
  return bytes;
}

/**
 * Splits a grid into chunks ready to insert into `grid_chunks` (add the layer version id).
 * Throws when the columns differ in length.
 */
export function packGridChunks(columns: GridColumns, chunkCells: number = GRID_CHUNK_CELLS): GridChunk[] {
  const cellCount = columns.lon.length;
  const lengths = { lat: columns.lat.length, value: columns.value.length, district: columns.district?.length ?? cellCount };
  for (const [name, length] of Object.entries(lengths)) {
    if (length !== cellCount) throw new Error(`grid column "${name}" has ${length} cells, lon has ${cellCount}`);
  }
  if (!Number.isInteger(chunkCells) || chunkCells < 1) throw new Error(`chunkCells must be a positive integer, got ${chunkCells}`);

  const chunks: GridChunk[] = [];
  for (let start = 0, chunk = 0; start < cellCount; start += chunkCells, chunk++) {
    const end = Math.min(start + chunkCells, cellCount);
    chunks.push({
      chunk,
      count: end - start,
      lon: packFloat64(columns.lon, start, end),
      lat: packFloat64(columns.lat, start, end),
      value: packFloat64(columns.value, start, end),
      district: columns.district ? packInt32(columns.district, start, end) : null,
    });
  }
  return chunks;
}

/** The stored part of a chunk row; BLOBs may come back from the driver as Buffer, Uint8Array or ArrayBuffer. */
export interface StoredGridChunk {
  chunk: number;
  count: number;
  lon: Uint8Array | ArrayBuffer;
  lat: Uint8Array | ArrayBuffer;
  value: Uint8Array | ArrayBuffer;
  district: Uint8Array | ArrayBuffer | null;
}

function viewOf(blob: Uint8Array | ArrayBuffer): DataView {
  return blob instanceof ArrayBuffer ? new DataView(blob) : new DataView(blob.buffer, blob.byteOffset, blob.byteLength);
}

function expectBytes(view: DataView, expected: number, column: string, chunk: number): void {
  if (view.byteLength !== expected) {
    throw new Error(`grid chunk ${chunk}: column "${column}" has ${view.byteLength} bytes, expected ${expected}`);
  }
}

/**
 * Joins stored chunks (in any order) back into one grid. `district` is present only when every chunk
 * carries one. Throws, naming the chunk and column, when a BLOB's length does not match its count or
 * chunk numbers are missing or repeated.
 */
export function unpackGridChunks(rows: readonly StoredGridChunk[]): GridColumns {
  const sorted = [...rows].sort((a, b) => a.chunk - b.chunk);
  sorted.forEach((row, position) => {
    if (row.chunk !== position) throw new Error(`grid chunks are not numbered 0..${sorted.length - 1}: found chunk ${row.chunk} at position ${position}`);
  });
  const cellCount = sorted.reduce((sum, row) => sum + row.count, 0);
  const hasDistrict = sorted.length > 0 && sorted.every((row) => row.district !== null);
  const columns: GridColumns = {
    lon: new Float64Array(cellCount),
    lat: new Float64Array(cellCount),
    value: new Float64Array(cellCount),
    district: hasDistrict ? new Int32Array(cellCount) : undefined,
  };

  let offset = 0;
  for (const row of sorted) {
    const floatColumns = [
      ["lon", viewOf(row.lon), columns.lon],
      ["lat", viewOf(row.lat), columns.lat],
      ["value", viewOf(row.value), columns.value],
    ] as const;
    for (const [name, view, target] of floatColumns) {
      expectBytes(view, row.count * FLOAT64_BYTES, name, row.chunk);
      for (let i = 0; i < row.count; i++) target[offset + i] = view.getFloat64(i * FLOAT64_BYTES, true);
    }
    if (columns.district && row.district) {
      const view = viewOf(row.district);
      expectBytes(view, row.count * INT32_BYTES, "district", row.chunk);
      for (let i = 0; i < row.count; i++) columns.district[offset + i] = view.getInt32(i * INT32_BYTES, true);
    }
    offset += row.count;
  }
  return columns;
}
