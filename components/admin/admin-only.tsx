import "server-only";
import { redirect } from "next/navigation";
import { can } from "@/lib/auth/permissions";
import { getCurrentUser, type CurrentUser } from "@/lib/auth/session";

/**
 * For admin pages: the signed-in administrator, or null for any other role (the page then shows
 * <AdminOnlyNotice />). Every admin page calls this itself — a layout's check does not stop the
 * page from rendering, since segments render in parallel.
 */
export async function getAdminOrNull(): Promise<CurrentUser | null> {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  return can(user.role, "admin:people") ? user : null;
}

/** What a non-administrator sees on an admin page. */
export function AdminOnlyNotice() {
  return (
    <div role="alert" data-testid="admin-only" className="space-y-2">
      <h1 className="text-2xl font-bold">Administrators only</h1>
      <p>People, the outbox and the audit trail are open to administrators. Ask one if you need something changed.</p>
    </div>
  );
}
