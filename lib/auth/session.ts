import "server-only";
import { getServerSession } from "next-auth";
import { findUserById } from "@/db/queries/users";
import type { Role } from "@/db/schema";
import { LeewayError } from "@/lib/errors";
import { authOptions } from "./options";
import { can, type Permission } from "./permissions";

export interface CurrentUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

/**
 * The signed-in person as the database knows them now: role, active flag and token version are
 * re-read on every request, so a role change or deactivation takes effect at once.
 */
export async function getCurrentUser(): Promise<CurrentUser | null> {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (!id) return null;
  const user = await findUserById({ id });
  // A password reset or an admin's "sign out everywhere" bumps tokenVersion and ends older sessions.
  if (!user || !user.active || user.tokenVersion !== session.user.tokenVersion) return null;
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}

/** For route handlers and server actions: no session → 401. */
export async function requireUser(): Promise<CurrentUser> {
  const user = await getCurrentUser();
  if (!user) throw new LeewayError("unauthenticated", "Sign in to use Leeway.");
  return user;
}

/** No session → 401; a role without the permission → 403. */
export async function requirePermission(permission: Permission): Promise<CurrentUser> {
  const user = await requireUser();
  if (!can(user.role, permission)) {
    throw new LeewayError("forbidden", `Your role (${user.role}) may not do this.`);
  }
  return user;
}
