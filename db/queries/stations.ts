import "server-only";
import { asc, desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { layers, layerVersions, stations } from "@/db/schema";

/** The newest version of the newest station layer, with its stations; undefined when none was uploaded. */
export async function findCurrentStationNetwork() {
  const [current] = await db
    .select({ layerId: layers.id, layerName: layers.name, versionId: layerVersions.id, versionNumber: layerVersions.number })
    .from(layerVersions)
    .innerJoin(layers, eq(layers.id, layerVersions.layerId))
    .where(eq(layers.kind, "stations"))
    .orderBy(desc(layerVersions.createdAt), desc(layerVersions.id))
    .limit(1);
  if (!current) return undefined;
  const rows = await db
    .select({ code: stations.code, lon: stations.lon, lat: stations.lat, operating: stations.operating })
    .from(stations)
    .where(eq(stations.layerVersionId, current.versionId))
    .orderBy(asc(stations.code));
  return { ...current, stations: rows };
}
