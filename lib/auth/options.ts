import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { getEnv } from "@/lib/env";
import { authorizeCredentials, SIGN_IN_UNAVAILABLE, SignInRefusedError } from "./authorize";

export const authOptions: NextAuthOptions = {
  secret: getEnv().NEXTAUTH_SECRET,
  session: { strategy: "jwt", maxAge: 8 * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "Leeway account",
      credentials: { email: { type: "email" }, password: { type: "password" } },
      // Rate-limited per account and per client address (lib/auth/sign-in-limit.ts).
      async authorize(raw, request) {
        try {
          return await authorizeCredentials(raw, request.headers);
        } catch (error) {
          // next-auth shows the thrown message on the form: only Leeway's own refusals may reach it.
          if (error instanceof SignInRefusedError) throw error;
          console.error(error);
          throw new Error(SIGN_IN_UNAVAILABLE);
        }
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
