import type { Metadata } from "next";
import { AdminOnlyNotice, getAdminOrNull } from "@/components/admin/admin-only";
import { InviteForm } from "@/components/admin/invite-form";
import { PersonControls } from "@/components/admin/person-controls";
import { ROLE_DESCRIPTIONS } from "@/components/admin/role-options";
import { listPeople, type PersonRow } from "@/db/queries/people";

export const metadata: Metadata = { title: "People" };

function formatDay(at: Date): string {
  return at.toISOString().slice(0, 10);
}

/** Where an account stands: signed up, waiting for its invitation to be used, or switched off. */
function accountStatus(person: PersonRow, now: Date): string {
  if (!person.active) return "Deactivated";
  if (person.hasPassword) return "Active";
  if (person.inviteExpiresAt && person.inviteExpiresAt > now) return `Invited · link valid until ${formatDay(person.inviteExpiresAt)}`;
  return "Invited · link expired";
}

export default async function PeoplePage() {
  const admin = await getAdminOrNull();
  if (!admin) return <AdminOnlyNotice />;
  const people = await listPeople();
  const now = new Date();

  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <h1 className="text-2xl font-bold">People</h1>
        <p className="max-w-3xl text-ink-muted">
          Everyone who can sign in to this workspace. A role change or deactivation signs the person out at once; Leeway always
          keeps at least one active administrator.
        </p>
      </div>
      <InviteForm />
      <table className="w-full border-collapse text-left text-sm" data-testid="people-table">
        <thead className="border-b border-line-strong">
          <tr>
            <th scope="col" className="py-2 pr-4 font-semibold">Name</th>
            <th scope="col" className="py-2 pr-4 font-semibold">E-mail</th>
            <th scope="col" className="py-2 pr-4 font-semibold">Role</th>
            <th scope="col" className="py-2 pr-4 font-semibold">Account</th>
            <th scope="col" className="py-2 font-semibold">Change</th>
          </tr>
        </thead>
        <tbody>
          {people.map((person) => (
            <tr key={person.id} className="border-b border-line align-top" data-testid={`person-${person.email}`}>
              <td className="py-3 pr-4">
                {person.name}
                {person.isDemo && <span className="ml-2 rounded-full border border-line-strong px-2 text-xs text-ink-muted">demo</span>}
              </td>
              <td className="py-3 pr-4">{person.email}</td>
              <td className="py-3 pr-4">
                {ROLE_DESCRIPTIONS[person.role].label}
                <span className="block text-xs text-ink-muted">{ROLE_DESCRIPTIONS[person.role].does}</span>
              </td>
              <td className="py-3 pr-4">{accountStatus(person, now)}</td>
              <td className="py-3">
                <PersonControls person={{ id: person.id, name: person.name, role: person.role, active: person.active, hasPassword: person.hasPassword }} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
