import Link from "next/link";
import { redirect } from "next/navigation";
import { Wordmark } from "@/components/brand/wordmark";
import { CautionNote } from "@/components/shell/caution-note";
import { MainNav } from "@/components/shell/main-nav";
import { NAV_ITEMS } from "@/components/shell/nav-items";
import { SignOutButton } from "@/components/shell/sign-out-button";
import { can } from "@/lib/auth/permissions";
import { getCurrentUser } from "@/lib/auth/session";
import { Providers } from "../providers";

const ROLE_LABELS = { admin: "Administrator", planner: "Planner", trainer: "Trainer", council: "Council member" } as const;

/** The signed-in shell: product name, the sections the role may use, the caution on every page. */
export default async function WorkspaceLayout({ children }: { children: React.ReactNode }) {
  const user = await getCurrentUser();
  if (!user) redirect("/sign-in");
  const items = NAV_ITEMS.filter((item) => !item.permission || can(user.role, item.permission));

  return (
    <Providers>
      <div className="flex min-h-screen flex-col">
        <header className="no-print border-b border-line bg-surface">
          <div className="mx-auto flex max-w-screen-2xl items-center gap-6 px-6 py-3">
            <Link href="/scenarios" aria-label="Leeway home">
              <Wordmark />
            </Link>
            <MainNav items={items} />
            <div className="ml-auto flex items-center gap-3 text-sm">
              <span data-testid="current-user">
                {user.name} · <span className="text-ink-muted">{ROLE_LABELS[user.role]}</span>
              </span>
              <SignOutButton />
            </div>
          </div>
        </header>
        <main className="mx-auto w-full max-w-screen-2xl flex-1 px-6 py-6">{children}</main>
        <footer className="border-t border-line bg-surface">
          <div className="mx-auto max-w-screen-2xl px-6 py-3">
            <CautionNote />
          </div>
        </footer>
      </div>
    </Providers>
  );
}
