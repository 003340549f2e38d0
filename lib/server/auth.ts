/**
 * Sign-in: e-mail magic links (through the local mail fake) and passwords for invited users.
 * Sessions are JWTs in httpOnly, sameSite=lax cookies (next-auth's defaults); the role is NOT taken
 * from the token but read from the database on every request (lib/server/session.ts), so a role
 * change or a deactivation takes effect at once. There is no middleware: every page and handler
 * checks for itself.
 */
import NextAuth, { CredentialsSignin } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import Nodemailer from "next-auth/providers/nodemailer";
import { KyselyAdapter } from "@auth/kysely-adapter";
import type { Adapter } from "next-auth/adapters";
import { createHash } from "node:crypto";
import { getDb } from "@/db";
import { recordUsedSignInLink, userByEmail } from "@/db/queries/accounts";
import { verifyPassword, DUMMY_HASH } from "./passwords";
import { checkRateLimit, recordAttempt } from "./rate-limit";
import { appUrl, env, smtpSettings } from "@/lib/env";
import { sendMail } from "@/lib/jobs/mail";

class RateLimited extends CredentialsSignin {
  code = "rate_limited";
}

export function hashLinkToken(token: string): string {
  // next-auth stores sha256(token + secret) in VerificationToken.
  return createHash("sha256").update(`${token}${env().AUTH_SECRET}`).digest("hex");
}

function adapter(): Adapter {
  const db = getDb();
  // The adapter's types are for its own four tables; ours has more, which it never touches.
  const base = KyselyAdapter(db as never) as Adapter;
  return {
    ...base,
    async useVerificationToken(params) {
      const used = await base.useVerificationToken!(params);
      if (used) await recordUsedSignInLink(db, params.token, params.identifier);
      return used;
    },
  };
}

export const { handlers, auth, signIn, signOut } = NextAuth(() => ({
  adapter: adapter(),
  session: { strategy: "jwt", maxAge: 8 * 60 * 60 },
  trustHost: true,
  logger: {
    // Wrong passwords, refused sign-ins and requests without a CSRF token are expected traffic:
    // one line each, no stack trace. Anything else is logged in full.
    error(error) {
      const name = (error as { type?: string }).type ?? error.name;
      if (["CredentialsSignin", "MissingCSRF", "AccessDenied", "Verification"].includes(name))
        console.warn(`[auth] ${name}`);
      else console.error("[auth]", error);
    },
  },
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in/problem" },
  providers: [
    Nodemailer({
      // The provider wants a server, but never uses it: sendVerificationRequest below queues a mail job.
      server: {
        host: smtpSettings().host,
        port: smtpSettings().port,
        auth: { user: smtpSettings().user, pass: smtpSettings().password },
      },
      from: smtpSettings().from,
      maxAge: 24 * 60 * 60,
      async sendVerificationRequest({ identifier, url }) {
        // Same answer for unknown or deactivated addresses; only invited, active people get a link.
        const user = await userByEmail(getDb(), identifier);
        if (!user || user.deactivated_at) return;
        // The mail links to our own page, which tells an expired or used link from a good one
        // before handing over to next-auth's callback.
        const u = new URL(url);
        const link = `${appUrl()}/sign-in/link?${u.searchParams.toString()}`;
        // A mail job (retried while SMTP is down); next-auth has already stored the token.
        await sendMail.send(getDb(), { template: "sign-in", to: identifier, link });
      },
    }),
    Credentials({
      credentials: { email: {}, password: {} },
      async authorize(credentials, request) {
        const email = String(credentials?.email ?? "")
          .trim()
          .toLowerCase();
        const password = String(credentials?.password ?? "");
        const ip = request.headers.get("x-forwarded-for")?.split(",")[0]?.trim() ?? "local";
        if (!email || !password || password.length > 200) return null;
        if (!(await checkRateLimit(email, ip))) throw new RateLimited();
        const user = await userByEmail(getDb(), email);
        // Compare against a dummy hash for unknown e-mails so both take the same time.
        const ok = await verifyPassword(password, user?.password_hash ?? DUMMY_HASH);
        const good = !!user && !!user.password_hash && ok && !user.deactivated_at;
        await recordAttempt(email, ip, good);
        if (!good) return null;
        return { id: user.id, email: user.email, name: user.name };
      },
    }),
  ],
  callbacks: {
    async signIn({ user }) {
      if (!user?.email) return false;
      const row = await userByEmail(getDb(), user.email);
      return !!row && !row.deactivated_at;
    },
    async jwt({ token, user }) {
      if (user?.id) token.sub = user.id;
      // Keep the token small: only who, never what they may do.
      return { sub: token.sub, email: token.email, name: token.name, iat: token.iat, exp: token.exp, jti: token.jti };
    },
    async session({ session, token }) {
      return {
        expires: session.expires,
        user: { id: token.sub ?? "", email: session.user?.email ?? "", name: session.user?.name ?? null },
      } as typeof session;
    },
  },
}));
