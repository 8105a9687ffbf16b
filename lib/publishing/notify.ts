import "server-only";
import { listActiveCouncilMembers } from "@/db/queries/people";
import type { VisibilityChange } from "@/db/queries/publishing";
import { appUrl } from "@/lib/mail/links";
import { publicationMessage, withdrawalMessage } from "@/lib/mail/messages";
import { sendEach, type DeliveryReport } from "@/lib/mail/transport";
import type { VisibilityResponse } from "./contracts";

/** The council summary of a version, the page the publication notice links to. */
export function councilSummaryPath(scenarioId: number, versionNumber: number): string {
  return `/scenarios/${scenarioId}/council?v=${versionNumber}`;
}

/** E-mails every active council member about a publication (with headline, caution and provenance) or a withdrawal. */
export async function notifyCouncil(change: VisibilityChange, { actorName, note }: { actorName: string; note: string }): Promise<DeliveryReport> {
  const members = await listActiveCouncilMembers();
  const { scenario, after } = change;
  return sendEach(
    members.map((member) =>
      change.headline
        ? publicationMessage({
            to: member.email,
            scenarioName: scenario.name,
            versionNumber: after.number,
            publisherName: actorName,
            note,
            summaryLink: appUrl(councilSummaryPath(scenario.id, after.number)),
            headline: change.headline,
          })
        : withdrawalMessage({ to: member.email, scenarioName: scenario.name, versionNumber: after.number, actorName, reason: note }),
    ),
  );
}

/** The JSON the publish and share routes answer with. */
export function toVisibilityResponse(change: VisibilityChange, mail: DeliveryReport = { sent: [], failed: [] }): VisibilityResponse {
  return {
    version: { number: change.after.number, state: change.after.state, publishedAt: change.after.publishedAt?.toISOString() ?? null },
    mail,
  };
}
