import { CAUTION } from "@/lib/caution";
import { formatFigure, type Headline } from "@/lib/publishing/headline";
import type { MailMessage } from "./transport";

/** `2025-03-04 09:30 UTC`: e-mails are read in any time zone. */
function formatUtc(at: Date): string {
  return `${at.toISOString().replace("T", " ").slice(0, 16)} UTC`;
}

const ROLE_WORDS = { admin: "an administrator", planner: "a planner", trainer: "a trainer", council: "a council member" } as const;

/** The invitation: who invited whom, as what, and the single-use link with its expiry. */
export function invitationMessage(input: {
  to: string;
  name: string;
  role: keyof typeof ROLE_WORDS;
  inviterName: string;
  link: string;
  expiresAt: Date;
}): MailMessage {
  return {
    to: input.to,
    subject: "You are invited to Leeway",
    text: [
      `Hello ${input.name},`,
      "",
      `${input.inviterName} has invited you to Leeway as ${ROLE_WORDS[input.role]}.`,
      "Leeway is the planning workspace for earthquake early warning: how many seconds each place would get, where the blind zone lies and who would be alerted.",
      "",
      "Choose your password here (the link works once):",
      input.link,
      "",
      `The link expires at ${formatUtc(input.expiresAt)}. If it has expired, ask ${input.inviterName} for a new one.`,
    ].join("\n"),
  };
}

/** The password reset link, for someone who asked for it (or whose administrator did). */
export function passwordResetMessage(input: { to: string; name: string; link: string; expiresAt: Date }): MailMessage {
  return {
    to: input.to,
    subject: "Reset your Leeway password",
    text: [
      `Hello ${input.name},`,
      "",
      "Someone asked to reset the password of your Leeway account. Choose a new password here (the link works once):",
      input.link,
      "",
      `The link expires at ${formatUtc(input.expiresAt)}. Setting a new password signs you out everywhere else.`,
      "If you did not ask for this, ignore this message: your password stays as it is.",
    ].join("\n"),
  };
}

/** The council notice of a publication: figures, the link to the summary, the caution and the provenance line. */
export function publicationMessage(input: {
  to: string;
  scenarioName: string;
  versionNumber: number;
  publisherName: string;
  note: string;
  summaryLink: string;
  headline: Headline;
}): MailMessage {
  const figures = input.headline.figures.map((figure) => `  ${figure.label}: ${formatFigure(figure)}`);
  return {
    to: input.to,
    subject: `Leeway: "${input.scenarioName}" version ${input.versionNumber} published to council`,
    text: [
      `${input.publisherName} has published version ${input.versionNumber} of the scenario "${input.scenarioName}" to council.`,
      "",
      ...(input.note ? [`Note: ${input.note}`, ""] : []),
      "Headline figures:",
      ...figures,
      ...(input.headline.exposureNote ? [`  Exposure figures are not included: ${input.headline.exposureNote}`] : []),
      "",
      "Read the council summary:",
      input.summaryLink,
      "",
      `Caution: ${CAUTION}`,
      "",
      `How it was made: ${input.headline.provenance}`,
    ].join("\n"),
  };
}

/** The council notice that a version was withdrawn, with the reason given. */
export function withdrawalMessage(input: { to: string; scenarioName: string; versionNumber: number; actorName: string; reason: string }): MailMessage {
  return {
    to: input.to,
    subject: `Leeway: "${input.scenarioName}" version ${input.versionNumber} withdrawn from council`,
    text: [
      `${input.actorName} has withdrawn version ${input.versionNumber} of the scenario "${input.scenarioName}" from council.`,
      `Reason: ${input.reason}`,
      "",
      "Its council summary is no longer available. Figures from it that you have kept should not be used.",
      "",
      `Caution: ${CAUTION}`,
    ].join("\n"),
  };
}
