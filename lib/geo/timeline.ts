/**
 * The alert timeline (METHODS.md §2): detection when the P wave reaches the k-th nearest
 * operating station, then the P-data window, telemetry and processing give the moment the alert
 * is issued (`alertIssuedS`); each channel adds its delivery delay. Times in s after origin.
 */
import type { Channel, ResolvedScenario } from "@/lib/scenario/resolve";
import { geodesicDistanceKm } from "./distance";
import type { TravelTimeTable } from "./velocity/travel-time-table";

/** One station's P pick. */
export interface StationPick {
  id: string;
  lon: number;
  lat: number;
  epicentralKm: number;
  pArrivalS: number;
  operating: boolean;
}

/** When the alert leaves the system and reaches each channel's users. */
export interface AlertTimeline {
  /** Operating stations first, by P arrival; then stations that are off. */
  stations: StationPick[];
  /** P arrival at the k-th nearest operating station, s. */
  detectionS: number;
  triggerStations: number;
  alertIssuedS: number;
  /** Per channel (scenario order; the first is primary): alert issued + delivery. */
  channels: (Channel & { alertS: number })[];
}

/** Builds the timeline from the station network and a P table for the hypocentre depth. */
export function computeAlertTimeline(scenario: ResolvedScenario, pTable: TravelTimeTable): AlertTimeline {
  const { source, timing } = scenario;
  const stations = scenario.stations.map((station): StationPick => {
    const epicentralKm = geodesicDistanceKm(source.lon, source.lat, station.lon, station.lat);
    return { ...station, epicentralKm, pArrivalS: pTable.timeS(epicentralKm, source.depthKm) };
  });
  stations.sort((a, b) => Number(b.operating) - Number(a.operating) || a.pArrivalS - b.pArrivalS || a.id.localeCompare(b.id));
  const detectionS = stations[timing.triggerStations - 1].pArrivalS;
  const alertIssuedS = detectionS + timing.pWindowS + timing.telemetryS + timing.processingS;
  return {
    stations,
    detectionS,
    triggerStations: timing.triggerStations,
    alertIssuedS,
    channels: scenario.channels.map((c) => ({ ...c, alertS: alertIssuedS + c.deliveryS })),
  };
}
