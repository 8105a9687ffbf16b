import { describe, expect, it } from "vitest";
import { extendBounds } from "@/lib/map/bounds";
import { sourcesToGeoJson, stationsToGeoJson } from "@/lib/map/overlays";

describe("map overlays", () => {
  it("extends bounds to take in points outside them and leaves inside points alone", () => {
    expect(extendBounds([-127, -48, -125, -46], [{ lon: -128.5, lat: -47 }, { lon: -126, lat: -45.5 }])).toEqual([-128.5, -48, -125, -45.5]);
    expect(extendBounds([-127, -48, -125, -46], [{ lon: -126, lat: -47 }])).toEqual([-127, -48, -125, -46]);
  });

  it("turns stations and sources into GeoJSON points in lon, lat order (RFC 7946 §3.1.1)", () => {
    const stations = stationsToGeoJson([
      { id: "TS01", lon: -126.1, lat: -46.9, operating: true },
      { id: "TS02", lon: -126.2, lat: -47.0, operating: false },
    ]);
    expect(stations.features.map((f) => [f.geometry.coordinates, f.properties])).toEqual([
      [[-126.1, -46.9], { id: "TS01", operating: 1 }],
      [[-126.2, -47.0], { id: "TS02", operating: 0 }],
    ]);
    const [source] = sourcesToGeoJson([{ name: "Test", lon: -127.8, lat: -46.5, mw: 8.4, depthKm: 20.4, faultType: "interplate" }]).features;
    expect(source.geometry.coordinates).toEqual([-127.8, -46.5]);
    expect(source.properties?.label).toBe("Mw 8.4, 20 km deep");
  });
});
