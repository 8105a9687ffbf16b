"use client";

import { Button } from "@/components/ui/button";
import type { DraftAction, ScenarioDraft } from "@/lib/workspace/draft";
import { NumberField } from "./fields";
import type { IssueLookup } from "./issues";

/**
 * The scenario's stations: id, position and whether each is operating, editable here or on the
 * map (drag a station; "Add on the map" then click). Only operating stations trigger an alert.
 */
export function StationTable({
  draft,
  dispatch,
  issueAt,
  addingOnMap,
  onAddOnMap,
}: {
  draft: ScenarioDraft;
  dispatch: (a: DraftAction) => void;
  issueAt: IssueLookup;
  addingOnMap: boolean;
  onAddOnMap: (on: boolean) => void;
}) {
  const operating = draft.stations.filter((s) => s.operating !== false).length;
  const listIssue = issueAt("stations");
  return (
    <div className="space-y-2" data-testid="station-table">
      <div className="flex flex-wrap items-center gap-2">
        <p className="text-sm">
          <span data-testid="station-count">{draft.stations.length}</span> stations, {operating} operating
        </p>
        <Button type="button" variant="secondary" className="ml-auto px-2 py-1" onClick={() => onAddOnMap(!addingOnMap)} aria-pressed={addingOnMap}>
          {addingOnMap ? "Click the map to place it…" : "Add on the map"}
        </Button>
        <Button
          type="button"
          variant="secondary"
          className="px-2 py-1"
          data-testid="add-station"
          onClick={() => dispatch({ type: "add-station", at: { lon: draft.source.lon, lat: draft.source.lat } })}
        >
          Add at the epicentre
        </Button>
      </div>
      {listIssue && <p className="text-xs text-error-ink">{listIssue}</p>}
      <div className="max-h-[28rem] overflow-auto rounded-card border border-line">
        <table className="w-full text-sm">
          <thead className="sticky top-0 bg-paper text-left text-xs text-ink-muted">
            <tr>
              <th className="px-2 py-1 font-semibold">Id</th>
              <th className="px-2 py-1 font-semibold">Longitude (°)</th>
              <th className="px-2 py-1 font-semibold">Latitude (°)</th>
              <th className="px-2 py-1 font-semibold">Operating</th>
              <th className="px-2 py-1">
                <span className="sr-only">Delete</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {draft.stations.map((station, index) => {
              const idIssue = issueAt(`stations[${index}].id`);
              return (
                <tr key={index} className="border-t border-line align-top" data-testid={`station-row-${index}`}>
                  <td className="px-2 py-1">
                    <input
                      aria-label={`Station ${index + 1} id`}
                      value={station.id}
                      onChange={(event) => dispatch({ type: "set-station", index, patch: { id: event.target.value } })}
                      aria-invalid={idIssue ? true : undefined}
                      className="w-20 rounded-card border border-line-strong bg-surface px-1 py-0.5 text-sm"
                    />
                    {idIssue && <span className="block text-xs text-error-ink">{idIssue}</span>}
                  </td>
                  <td className="px-2 py-1">
                    <NumberField label={`Station ${station.id} longitude`} value={station.lon} onChange={(lon) => dispatch({ type: "set-station", index, patch: { lon: lon ?? Number.NaN } })} error={issueAt(`stations[${index}].lon`)} testId={`station-lon-${index}`} hideLabel />
                  </td>
                  <td className="px-2 py-1">
                    <NumberField label={`Station ${station.id} latitude`} value={station.lat} onChange={(lat) => dispatch({ type: "set-station", index, patch: { lat: lat ?? Number.NaN } })} error={issueAt(`stations[${index}].lat`)} testId={`station-lat-${index}`} hideLabel />
                  </td>
                  <td className="px-2 py-1 text-center">
                    <input
                      type="checkbox"
                      aria-label={`Station ${station.id} operating`}
                      checked={station.operating !== false}
                      onChange={(event) => dispatch({ type: "set-station", index, patch: { operating: event.target.checked ? undefined : false } })}
                    />
                  </td>
                  <td className="px-2 py-1">
                    <Button type="button" variant="quiet" className="px-1 py-0.5" aria-label={`Delete station ${station.id}`} onClick={() => dispatch({ type: "delete-station", index })}>
                      Delete
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
