import { findCurrentStationNetwork } from "@/db/queries/stations";
import { route } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";

/** GET /api/stations — today's station network (the newest station layer version). */
export const GET = route(async () => {
  await requireUser();
  const network = await findCurrentStationNetwork();
  return Response.json({
    layer: network ? { id: network.layerId, name: network.layerName, version: network.versionNumber } : null,
    stations: network?.stations ?? [],
  });
});
