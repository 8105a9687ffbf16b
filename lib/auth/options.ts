import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { getEnv } from "@/lib/env";
import { authorizeCredentials } from "./authorize";

export const authOptions: NextAuthOptions = {
  secret: getEnv().NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 8 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "Leeway account",
      credentials: { email: { type: "email" }, password: { type: "password" } },
      // Rate-limited per account and per client address (lib/auth/sign-in-limit.ts).
      authorize: (raw, request) => authorizeCredentials(raw, request.headers),
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
