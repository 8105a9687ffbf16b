/**
 * Leeway's basemap palette: low-chroma paper and slate tones, so scenario overlays (warning seconds,
 * intensity) carry the colour and the basemap stays quiet behind them. Leeway's own hex values.
 */
export const MAP_COLOURS = {
  sea: "#c9d8dc",
  shelfOuter: "#d3e0e3",
  shelfInner: "#dde8ea",
  land: "#f2efe7",
  coast: "#93a7ad",
  districtLine: "#b3a68f",
  districtLabel: "#7c705c",
  rail: "#6b6774",
  railTie: "#f2efe7",
  townDot: "#3a4750",
  townLabel: "#24313a",
  labelHalo: "#f7f5ef",
  station: "#1d5c66",
  stationOutline: "#ffffff",
  stationOff: "#f7f5ef",
  stationOffOutline: "#6f7f86",
  source: "#a13f27",
  sourceHalo: "#fbf3ef",
  /** An uploaded layer drawn for checking (components/layers): a muted violet apart from stations and sources. */
  layerOverlay: "#5a4f8c",
  layerOverlayOutline: "#ffffff",
} as const;

export type MapColour = keyof typeof MAP_COLOURS;
