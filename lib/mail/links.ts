import "server-only";
import { getEnv } from "@/lib/env";

/** An absolute address in this Leeway workspace (NEXTAUTH_URL is its public URL), for links in e-mails. */
export function appUrl(path: string): string {
  return new URL(path, getEnv().NEXTAUTH_URL).toString();
}
