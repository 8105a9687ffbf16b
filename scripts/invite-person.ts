// `npm run people:invite -- --email ann@council.example --name "Ann Example" [--role admin]`
// Invites someone from the command line, the way a new production workspace gets its first
// administrator: the account is created without a password, the invitation is e-mailed through
// SMTP_*, and the link is printed too, in case mail is not set up yet. Run with the app's .env
// loaded (DATABASE_URL, NEXTAUTH_URL, SMTP_*); the script is started with Node's react-server
// condition so the app's server-only modules load outside Next.
import { parseArgs } from "node:util";
import { z } from "zod";
import { invitePerson } from "@/db/queries/people";
import { ROLES } from "@/db/schema";
import { appUrl } from "@/lib/mail/links";
import { invitationMessage } from "@/lib/mail/messages";
import { sendEach } from "@/lib/mail/transport";

const argsSchema = z.object({
  email: z.email("--email must be an e-mail address"),
  name: z.string().trim().min(1, "--name is required"),
  role: z.enum(ROLES, { error: `--role must be one of ${ROLES.join(", ")}` }).default("admin"),
});

async function main() {
  const { values } = parseArgs({ options: { email: { type: "string" }, name: { type: "string" }, role: { type: "string" } } });
  const parsed = argsSchema.safeParse(values);
  if (!parsed.success) throw new Error(parsed.error.issues.map((issue) => issue.message).join("; "));
  const { person, token, expiresAt } = await invitePerson({ actorId: null, ...parsed.data });
  const link = appUrl(`/invite/${token}`);
  const report = await sendEach([
    invitationMessage({ to: person.email, name: person.name, role: person.role, inviterName: "your Leeway administrator", link, expiresAt }),
  ]);
  console.log(`Invited ${person.name} <${person.email}> as ${person.role}.`);
  console.log(report.failed.length ? `The e-mail could not be sent (${report.failed[0].reason}).` : "The invitation was e-mailed.");
  console.log(`Invitation link (works once, until ${expiresAt.toISOString()}):\n${link}`);
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error(`Leeway could not invite: ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  },
);
