import { describe, expect, it } from "vitest";
import { GRID_CHUNK_CELLS, packGridChunks, unpackGridChunks } from "@/db/grid-codec";

function sampleGrid(cellCount: number) {
  const lon = new Float64Array(cellCount);
  const lat = new Float64Array(cellCount);
  const value = new Float64Array(cellCount);
  const district = new Int32Array(cellCount);
  for (let i = 0; i < cellCount; i++) {
    lon[i] = -125 + i * 1e-5;
    lat[i] = -47 - i * 1e-5;
    value[i] = i * 0.25;
    district[i] = (i % 13) - 1;
  }
  return { lon, lat, value, district };
}

describe("grid codec", () => {
  it("writes IEEE 754 doubles and two's-complement Int32 little-endian", () => {
    // IEEE 754 binary64: 1.0 = 0x3FF0000000000000, -2.0 = 0xC000000000000000; Int32 -1 = 0xFFFFFFFF.
    const [chunk] = packGridChunks({
      lon: new Float64Array([1]),
      lat: new Float64Array([-2]),
      value: new Float64Array([0]),
      district: new Int32Array([-1]),
    });
    expect([...chunk.lon]).toEqual([0, 0, 0, 0, 0, 0, 0xf0, 0x3f]);
    expect([...chunk.lat]).toEqual([0, 0, 0, 0, 0, 0, 0x00, 0xc0]);
    expect([...(chunk.district ?? [])]).toEqual([0xff, 0xff, 0xff, 0xff]);
  });

  it("splits at the chunk size and joins chunks given in any order", () => {
    const grid = sampleGrid(GRID_CHUNK_CELLS + 3);
    const chunks = packGridChunks(grid);
    expect(chunks.map((c) => c.count)).toEqual([GRID_CHUNK_CELLS, 3]);
    const back = unpackGridChunks([...chunks].reverse());
    expect(back.lon).toEqual(grid.lon);
    expect(back.lat).toEqual(grid.lat);
    expect(back.value).toEqual(grid.value);
    expect(back.district).toEqual(grid.district);
  });

  it("reads BLOBs that sit at an odd offset inside a larger buffer", () => {
    const [chunk] = packGridChunks({ lon: new Float64Array([12.5]), lat: new Float64Array([-3.25]), value: new Float64Array([7]) });
    const shifted = (blob: Buffer) => {
      const holder = new Uint8Array(blob.length + 3);
      holder.set(blob, 3);
      return holder.subarray(3);
    };
    const back = unpackGridChunks([{ ...chunk, lon: shifted(chunk.lon), lat: shifted(chunk.lat), value: shifted(chunk.value) }]);
    expect([...back.lon, ...back.lat, ...back.value]).toEqual([12.5, -3.25, 7]);
    expect(back.district).toBeUndefined();
  });

  it("refuses columns of different lengths, naming the column", () => {
    expect(() =>
      packGridChunks({ lon: new Float64Array(3), lat: new Float64Array(2), value: new Float64Array(3) }),
    ).toThrow(/"lat" has 2 cells, lon has 3/);
  });

  it("refuses a chunk whose BLOB does not match its count, and missing chunks", () => {
    const chunks = packGridChunks(sampleGrid(10), 4);
    expect(() => unpackGridChunks([{ ...chunks[1], count: 5 }, chunks[0], chunks[2]])).toThrow(/chunk 1: column "lon" has 32 bytes, expected 40/);
    expect(() => unpackGridChunks([chunks[0], chunks[2]])).toThrow(/found chunk 2 at position 1/);
  });
});
