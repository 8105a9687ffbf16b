import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { findUserByEmail } from "@/db/queries/users";
import { getEnv } from "@/lib/env";
import { verifyPassword } from "./password";

const credentialsSchema = z.object({
  email: z.email(),
  password: z.string().min(1),
});

/** What the sign-in form shows for any failed attempt: it does not say which part was wrong. */
export const SIGN_IN_FAILED = "E-mail or password is not right.";

export const authOptions: NextAuthOptions = {
  secret: getEnv().NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 8 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "Leeway account",
      credentials: { email: { type: "email" }, password: { type: "password" } },
      async authorize(raw) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) throw new Error(SIGN_IN_FAILED);
        const user = await findUserByEmail({ email: parsed.data.email });
        const ok = await verifyPassword(parsed.data.password, user?.passwordHash);
        if (!user || !ok || !user.active) throw new Error(SIGN_IN_FAILED);
        return { id: String(user.id), email: user.email, name: user.name, role: user.role, tokenVersion: user.tokenVersion };
      },
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user) {
        token.uid = Number(user.id);
        token.role = user.role;
        token.tokenVersion = user.tokenVersion;
      }
      return token;
    },
    session({ session, token }) {
      session.user = { ...session.user, id: token.uid, role: token.role, tokenVersion: token.tokenVersion };
      return session;
    },
  },
};
