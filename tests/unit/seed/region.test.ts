import { area, booleanPointInPolygon, point, polygon } from "@turf/turf";
import { Geodesic } from "geographiclib-geodesic";
import { beforeAll, describe, expect, it } from "vitest";
import { buildRegion, type Region } from "@/db/seed/region";

let region: Region;
beforeAll(() => {
  region = buildRegion();
});

const geodesicKm = (lon1: number, lat1: number, lon2: number, lat2: number) => (Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2).s12 ?? NaN) / 1000;

/** The square cell of a grid around a centre, as a lon/lat polygon. */
function cellPolygon(lon: number, lat: number, dLon: number, dLat: number) {
  const [w, e, s, n] = [lon - dLon / 2, lon + dLon / 2, lat - dLat / 2, lat + dLat / 2];
  return polygon([[[w, s], [e, s], [e, n], [w, n], [w, s]]]);
}

const onLand = (lon: number, lat: number) => booleanPointInPolygon(point([lon, lat]), region.land);

describe("the invented island's setting", () => {
  // Coordinates from memory (rounded to 0.1°): the nearest real land in every direction from 47°S, 126°W.
  const NEAREST_REAL_LAND = [
    { name: "Ducie Island", lat: -24.7, lon: -124.8 },
    { name: "Henderson Island", lat: -24.4, lon: -128.3 },
    { name: "Pitcairn Island", lat: -25.1, lon: -130.1 },
    { name: "Easter Island", lat: -27.1, lon: -109.4 },
    { name: "Sala y Gómez", lat: -26.5, lon: -105.4 },
    { name: "Rapa Iti", lat: -27.6, lon: -144.3 },
    { name: "Chatham Islands", lat: -44.0, lon: -176.5 },
    { name: "Antipodes Islands", lat: -49.7, lon: 178.8 },
    { name: "Peter I Island", lat: -68.8, lon: -90.6 },
    { name: "Antarctic coast, Siple Island", lat: -73.5, lon: -125.0 },
    { name: "Antarctic coast, Ruppert Coast", lat: -75.5, lon: -140.0 },
    { name: "Thurston Island", lat: -72.2, lon: -99.0 },
    { name: "Chile, Taitao peninsula", lat: -46.5, lon: -75.5 },
    { name: "Diego Ramírez Islands", lat: -56.5, lon: -68.7 },
  ];

  it("lies at least 500 km from every real land point listed (geodesic, GeographicLib)", () => {
    const ring = region.land.coordinates[0];
    let nearest = { km: Infinity, name: "" };
    for (const land of NEAREST_REAL_LAND) {
      for (const [lon, lat] of ring) {
        const km = geodesicKm(lon, lat, land.lon, land.lat);
        if (km < nearest.km) nearest = { km, name: land.name };
      }
    }
    console.info(`nearest listed real land: ${nearest.name}, ${nearest.km.toFixed(0)} km`);
    expect(nearest.km).toBeGreaterThan(500);
  });

  it("is 250–350 km across (the longest geodesic between coast vertices)", () => {
    const ring = region.land.coordinates[0].filter((_, i) => i % 4 === 0);
    let acrossKm = 0;
    for (let i = 0; i < ring.length; i++) {
      for (let j = i + 1; j < ring.length; j++) acrossKm = Math.max(acrossKm, geodesicKm(ring[i][0], ring[i][1], ring[j][0], ring[j][1]));
    }
    console.info(`island across: ${acrossKm.toFixed(0)} km`);
    expect(acrossKm).toBeGreaterThanOrEqual(250);
    expect(acrossKm).toBeLessThanOrEqual(350);
  });

  it("gives the same region on every call", () => {
    const again = buildRegion();
    expect(again.population.value).toEqual(region.population.value);
    expect(again.stations).toEqual(region.stations);
    expect(again.land).toEqual(region.land);
  });

  it("uses each name once, and no town shares a name with a district or the island", () => {
    const names = [region.name, ...region.districts.map((d) => d.name), ...region.towns.map((t) => t.name)];
    expect(new Set(names).size).toBe(names.length);
  });
});

describe("population", () => {
  it("totals 1,000,000 ± 1 % on cells of about 1 km² (turf's spherical area)", () => {
    const { value, lon, lat, dLonDeg, dLatDeg } = region.population;
    const total = value.reduce((a, b) => a + b, 0);
    expect(Math.abs(total - 1_000_000)).toBeLessThanOrEqual(10_000);
    for (const i of [0, Math.floor(lon.length / 2), lon.length - 1]) {
      const km2 = area(cellPolygon(lon[i], lat[i], dLonDeg, dLatDeg)) / 1e6;
      expect(km2).toBeGreaterThan(0.9);
      expect(km2).toBeLessThan(1.1);
    }
    expect(value.every((v) => Number.isInteger(v) && v >= 0)).toBe(true);
  });

  it("puts every populated cell on land", () => {
    const { value, lon, lat } = region.population;
    const offshore = [];
    for (let i = 0; i < value.length; i++) if (value[i] > 0 && !onLand(lon[i], lat[i])) offshore.push(i);
    expect(offshore).toEqual([]);
  });

  it("puts half the people on under 10 % of the land cells", () => {
    const { value, lon, lat, dLonDeg, dLatDeg } = region.population;
    const landCells = area(region.land) / area(cellPolygon(lon[0], lat[0], dLonDeg, dLatDeg));
    const sorted = [...value].sort((a, b) => b - a);
    let people = 0;
    let cells = 0;
    while (people < 500_000) people += sorted[cells++];
    console.info(`half the people on ${cells} cells of ${landCells.toFixed(0)} land cells`);
    expect(cells / landCells).toBeLessThan(0.1);
  });

  it("gives each of the three largest towns cells above 5,000 people/km²", () => {
    const { value, lon, lat, dLonDeg, dLatDeg } = region.population;
    const largest = [...region.towns].sort((a, b) => b.population - a.population).slice(0, 3);
    for (const town of largest) {
      let peak = 0;
      for (let i = 0; i < value.length; i++) {
        if (geodesicKm(lon[i], lat[i], town.lon, town.lat) > 3) continue;
        peak = Math.max(peak, value[i] / (area(cellPolygon(lon[i], lat[i], dLonDeg, dLatDeg)) / 1e6));
      }
      console.info(`${town.name}: peak ${peak.toFixed(0)} people/km²`);
      expect(peak).toBeGreaterThan(5000);
    }
  });
});

describe("districts", () => {
  it("has about a dozen districts that tile the land: areas add up, every cell lies in its own district", () => {
    expect(region.districts.length).toBeGreaterThanOrEqual(10);
    expect(region.districts.length).toBeLessThanOrEqual(14);
    const districtKm2 = region.districts.reduce((sum, d) => sum + area(d.geometry), 0) / 1e6;
    const landKm2 = area(region.land) / 1e6;
    expect(Math.abs(districtKm2 - landKm2) / landKm2).toBeLessThan(1e-4);

    const { lon, lat, district } = region.population;
    const misplaced = [];
    for (let i = 0; i < lon.length; i++) {
      const d = region.districts[district[i]];
      if (!d || !booleanPointInPolygon(point([lon[i], lat[i]]), d.geometry)) misplaced.push(i);
    }
    expect(misplaced).toEqual([]);
  });
});

describe("district boundaries", () => {
  it("run between two different districts, once each, and never along the coast", () => {
    expect(region.districtBoundaries.length).toBeGreaterThan(region.districts.length);
    const districtOf = (lon: number, lat: number) => region.districts.findIndex((d) => booleanPointInPolygon(point([lon, lat]), d.geometry));
    for (const line of region.districtBoundaries) {
      const [[lon1, lat1], [lon2, lat2]] = line.coordinates;
      const [midLon, midLat] = [(lon1 + lon2) / 2, (lat1 + lat2) / 2];
      // Step 100 m to either side, perpendicular to the segment (degrees scaled by the local km per degree).
      const [dxKm, dyKm] = [(lon2 - lon1) * 76, (lat2 - lat1) * 111];
      const lengthKm = Math.hypot(dxKm, dyKm);
      const [nLon, nLat] = [(-dyKm / lengthKm) * (0.1 / 76), (dxKm / lengthKm) * (0.1 / 111)];
      const left = districtOf(midLon + nLon, midLat + nLat);
      const right = districtOf(midLon - nLon, midLat - nLat);
      expect(left, JSON.stringify(line.coordinates)).toBeGreaterThanOrEqual(0);
      expect(right, JSON.stringify(line.coordinates)).toBeGreaterThanOrEqual(0);
      expect(left).not.toBe(right);
    }
  });
});

describe("stations", () => {
  it("has a few dozen stations with unique codes, all on land", () => {
    expect(region.stations.length).toBeGreaterThanOrEqual(30);
    expect(region.stations.length).toBeLessThanOrEqual(50);
    expect(new Set(region.stations.map((s) => s.code)).size).toBe(region.stations.length);
    expect(region.stations.filter((s) => !onLand(s.lon, s.lat))).toEqual([]);
  });

  it("is denser around the three largest towns than elsewhere (at least 3× per km²)", () => {
    const largest = [...region.towns].sort((a, b) => b.population - a.population).slice(0, 3);
    const radiusKm = 20;
    const nearTown = (s: { lon: number; lat: number }) => largest.some((t) => geodesicKm(s.lon, s.lat, t.lon, t.lat) <= radiusKm);
    const near = region.stations.filter(nearTown).length;
    const nearKm2 = largest.length * Math.PI * radiusKm ** 2; // the three discs do not overlap: the towns are > 40 km apart
    const elsewhereKm2 = area(region.land) / 1e6 - nearKm2;
    const ratio = near / nearKm2 / ((region.stations.length - near) / elsewhereKm2);
    console.info(`station density near the largest towns: ${ratio.toFixed(1)}× elsewhere`);
    expect(ratio).toBeGreaterThanOrEqual(3);
  });
});

describe("sources", () => {
  const byType = (t: string) => region.sources.find((s) => s.faultType === t)!;

  it("has an offshore subduction-interface source Mw ≥ 8 with a finite rupture of plausible size", () => {
    const s = byType("interplate");
    expect(s.mw).toBeGreaterThanOrEqual(8);
    expect(onLand(s.lon, s.lat)).toBe(false);
    const topDepthKm = s.depthKm - (s.rupture.widthKm / 2) * Math.sin((s.rupture.dipDeg * Math.PI) / 180);
    expect(topDepthKm).toBeGreaterThanOrEqual(0);
    // Strasser et al. (2010), interface events: log10 A = −3.476 + 0.952 Mw, σ 0.304 (from memory).
    const log10Area = Math.log10(s.rupture.lengthKm * s.rupture.widthKm);
    expect(Math.abs(log10Area - (-3.476 + 0.952 * s.mw))).toBeLessThan(0.304);
  });

  it("has an inland crustal source of Mw 6.5–7.2 sized by Wells & Coppersmith (1994) within one sigma", () => {
    const s = byType("crustal");
    expect(s.mw).toBeGreaterThanOrEqual(6.5);
    expect(s.mw).toBeLessThanOrEqual(7.2);
    expect(onLand(s.lon, s.lat)).toBe(true);
    // METHODS §8: subsurface length a = −2.44, b = 0.59, σ 0.16; down-dip width a = −1.01, b = 0.32, σ 0.15.
    expect(Math.abs(Math.log10(s.rupture.lengthKm) - (-2.44 + 0.59 * s.mw))).toBeLessThan(0.16);
    expect(Math.abs(Math.log10(s.rupture.widthKm) - (-1.01 + 0.32 * s.mw))).toBeLessThan(0.15);
  });

  it("has an intraslab source 50–100 km deep", () => {
    const s = byType("intraslab");
    expect(s.depthKm).toBeGreaterThanOrEqual(50);
    expect(s.depthKm).toBeLessThanOrEqual(100);
  });
});

describe("facilities", () => {
  it("has schools and hospitals on land, a hospital in each of the three largest towns", () => {
    const points = region.facilities.filter((f) => f.geometry.type === "Point");
    const schools = points.filter((f) => f.kind === "school");
    const hospitals = points.filter((f) => f.kind === "hospital");
    expect(schools.length).toBeGreaterThanOrEqual(20);
    expect(hospitals.length).toBeGreaterThanOrEqual(5);
    for (const f of points) {
      const [lon, lat] = f.geometry.coordinates as number[];
      expect(onLand(lon, lat), f.name).toBe(true);
    }
    for (const town of [...region.towns].sort((a, b) => b.population - a.population).slice(0, 3)) {
      const close = hospitals.some((h) => {
        const [lon, lat] = h.geometry.coordinates as number[];
        return geodesicKm(lon, lat, town.lon, town.lat) < 10;
      });
      expect(close, town.name).toBe(true);
    }
  });

  it("has a rail line of connected town-to-town segments that stays on land", () => {
    const rail = region.facilities.filter((f) => f.kind === "rail");
    expect(rail.length).toBeGreaterThanOrEqual(3);
    const lines = rail.map((f) => {
      if (f.geometry.type !== "LineString") throw new Error(`${f.name} is not a LineString`);
      return f.geometry.coordinates;
    });
    lines.forEach((line, i) => {
      for (const [lon, lat] of line) expect(onLand(lon, lat), rail[i].name).toBe(true);
      const [first, last] = [line[0], line[line.length - 1]];
      const atTown = (p: number[]) => region.towns.some((t) => geodesicKm(p[0], p[1], t.lon, t.lat) < 0.01);
      expect(atTown(first) && atTown(last), rail[i].name).toBe(true);
      if (i > 0) expect(first).toEqual(lines[i - 1][lines[i - 1].length - 1]);
    });
  });
});

describe("site condition", () => {
  it("has Vs30 on about 2 km land cells, soft near the shore and firm inland", () => {
    const { value, lon, lat, dLonDeg, dLatDeg } = region.siteCondition;
    const km2 = area(cellPolygon(lon[0], lat[0], dLonDeg, dLatDeg)) / 1e6;
    expect(km2).toBeGreaterThan(3.6);
    expect(km2).toBeLessThan(4.4);
    expect(value.every((v) => v >= 150 && v <= 900)).toBe(true);

    const ring = region.land.coordinates[0].filter((_, i) => i % 2 === 0);
    const shoreKm = (i: number) => Math.min(...ring.map(([x, y]) => geodesicKm(lon[i], lat[i], x, y)));
    const coastal: number[] = [];
    const inland: number[] = [];
    for (let i = 0; i < value.length; i += 7) {
      expect(onLand(lon[i], lat[i])).toBe(true);
      const d = shoreKm(i);
      if (d < 5) coastal.push(value[i]);
      else if (d > 30) inland.push(value[i]);
    }
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    console.info(`median Vs30: ${median(coastal)} m/s within 5 km of the shore, ${median(inland)} m/s beyond 30 km`);
    // NEHRP site classes (from memory): D (soft, 180–360 m/s) near the shore, C or firmer (> 360 m/s) inland.
    expect(median(coastal)).toBeLessThan(360);
    expect(median(inland)).toBeGreaterThan(360);
  });
});
