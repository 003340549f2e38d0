import { requirePage } from "@/lib/server/session";
import { EmptyState } from "@/components/ui/empty-state";
import { env, mailFakeUrl } from "@/lib/env";

export const metadata = { title: "Captured mail" };

type Mail = { id: string; at: string; to: string[]; subject: string; text: string };

// Local mode only: the mail fake keeps every message Echoline sends; nothing leaves the machine.
export default async function MailPage() {
  await requirePage("admin:mail");
  const base = mailFakeUrl();
  let mails: Mail[] | null = null;
  try {
    // Server-side only: the token never reaches the browser.
    const res = await fetch(`${base}/messages`, {
      cache: "no-store",
      headers: { "x-mail-fake-token": env().MAIL_FAKE_TOKEN ?? "" },
    });
    mails = res.ok ? ((await res.json()) as Mail[]) : null;
  } catch {
    mails = null;
  }
  return (
    <div className="grid gap-4">
      <h1 className="font-serif text-3xl font-semibold">Captured mail</h1>
      <p className="text-ink-2">
        Every e-mail Echoline sends in local mode is caught by the mail fake (also on its own page, at the address with
        its key that <code>npm start</code> prints).
      </p>
      {mails === null ? (
        <p role="alert">
          The mail fake is not running. <code>npm start</code> starts it.
        </p>
      ) : mails.length === 0 ? (
        <EmptyState title="No mail yet">
          Invite someone or ask for a sign-in link; the message shows up here.
        </EmptyState>
      ) : (
        <ul className="grid gap-3">
          {mails.slice(0, 50).map((m) => (
            <li key={m.id} className="rounded border border-rule p-3">
              <p className="font-medium">{m.subject}</p>
              <p className="text-sm text-ink-2">
                To {m.to.join(", ")} · {new Date(m.at).toLocaleString("en-GB")}
              </p>
              <pre className="mt-2 whitespace-pre-wrap break-all text-sm">{m.text}</pre>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
