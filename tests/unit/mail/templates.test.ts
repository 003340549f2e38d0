/**
 * Mail templates escape every interpolated value. The expected texts are written out by hand from
 * the HTML escaping rules (WHATWG HTML, "escaping a string": & < > " become entities), not produced
 * by the library the templates use.
 */
import { describe, expect, it } from "vitest";
import { invitationEmail, renderMail, signInEmail } from "@/lib/mail/templates";

describe("mail templates", () => {
  it("an inviter's name with markup arrives as text in the HTML part", () => {
    const m = invitationEmail("http://localhost:3000/invite/abc", "curator", `<script>alert("x")</script> & Co`);
    expect(m.html).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; Co invited you");
    expect(m.html).not.toContain("<script>");
    // The plain-text part is not HTML: it keeps the name as typed.
    expect(m.text).toContain(`<script>alert("x")</script> & Co invited you to Echoline as curator.`);
  });

  it("a link with a quote cannot break out of its href", () => {
    const m = signInEmail('http://localhost:3000/sign-in/link?token=a"onmouseover="x');
    expect(m.html).not.toMatch(/href="[^"]*"onmouseover/);
  });

  it("refuses a link that is not http(s)", () => {
    expect(() => signInEmail("javascript:alert(1)")).toThrow(/javascript:/);
  });

  it("renders each template the mail job knows", () => {
    expect(renderMail({ template: "sign-in", to: "a@example.invalid", link: "http://localhost/x" }).subject).toBe(
      "Your Echoline sign-in link",
    );
    expect(
      renderMail({
        template: "invitation",
        to: "a@example.invalid",
        link: "http://localhost/invite/t",
        role: "editor",
        inviter: "An Admin",
      }).text,
    ).toContain("as editor");
  });
});
