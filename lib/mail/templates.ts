/**
 * The e-mails Echoline sends. Every interpolated value goes through escape-html in the HTML part (a
 * name such as `<script>` arrives as text), and links are checked to be http(s) before they are used
 * as an href.
 */
import escapeHtml from "escape-html";
import type { MailJobData } from "@/lib/jobs/mail";
import { LABELS } from "@/lib/vocabulary";

export type RenderedMail = { subject: string; text: string; html: string };

function safeLink(link: string): string {
  const u = new URL(link);
  if (u.protocol !== "http:" && u.protocol !== "https:") throw new Error(`Refusing a ${u.protocol} link in an e-mail`);
  return u.toString();
}

export function signInEmail(link: string): RenderedMail {
  const href = escapeHtml(safeLink(link));
  return {
    subject: "Your Echoline sign-in link",
    text: `Sign in to Echoline with this link (valid for 24 hours, once):\n\n${link}\n\nIf you did not ask for it, ignore this e-mail.`,
    html: `<p>Sign in to Echoline with this link (valid for 24 hours, once):</p><p><a href="${href}">Sign in to Echoline</a></p><p>If you did not ask for it, ignore this e-mail.</p>`,
  };
}

export function invitationEmail(link: string, role: string, inviter: string): RenderedMail {
  const href = escapeHtml(safeLink(link));
  const roleName = (LABELS.role as Record<string, string>)[role]?.toLowerCase() ?? role;
  return {
    subject: "You are invited to Echoline",
    text: `${inviter} invited you to Echoline as ${roleName}.\n\nChoose your password here (valid for 7 days):\n\n${link}\n\nYou can also sign in with an e-mail link at any time.`,
    html: `<p>${escapeHtml(inviter)} invited you to Echoline as <strong>${escapeHtml(roleName)}</strong>.</p><p><a href="${href}">Choose your password</a> (valid for 7 days).</p><p>You can also sign in with an e-mail link at any time.</p>`,
  };
}

export function renderMail(data: MailJobData): RenderedMail {
  switch (data.template) {
    case "invitation":
      return invitationEmail(data.link, data.role, data.inviter);
    case "sign-in":
      return signInEmail(data.link);
  }
}
