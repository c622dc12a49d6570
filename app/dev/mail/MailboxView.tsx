"use client";
// Kept messages, newest first, as plain text with their links clickable (the HTML part is not rendered here).
import { ErrorState } from "@/components/ErrorState";
import { PageTitle } from "@/components/PageTitle";
import { useApi } from "@/components/use-api";

type Message = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string };

function Linked({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/\S+)/g);
  return (
    <>
      {parts.map((p, i) =>
        /^https?:\/\//.test(p) ? (
          <a key={i} href={p} className="break-all font-semibold text-turf-dark underline">
            {p}
          </a>
        ) : (
          <span key={i}>{p}</span>
        ),
      )}
    </>
  );
}

export function MailboxView({ email }: { email: string }) {
  const mail = useApi<{ messages: Message[] }>("/api/dev/mail");
  return (
    <>
      <PageTitle sub={`For local use only: what Farfield sent to ${email} through the local fake SMTP server (npm start, npm run dev, npm test). A real deployment sends through its SMTP provider instead.`}>Local mailbox</PageTitle>
      {mail.error ? (
        <ErrorState error={mail.error} what="mailbox" onRetry={() => mail.mutate()} />
      ) : !mail.data ? (
        <p role="status">Opening the mailbox…</p>
      ) : mail.data.messages.length === 0 ? (
        <p className="text-ink-soft">No messages to {email} yet.</p>
      ) : (
        <ul className="space-y-4">
          {mail.data.messages.slice(0, 50).map((m) => (
            <li key={m.id} className="rounded-xl border border-ink/10 bg-paper-raised p-4">
              <p className="text-sm text-ink-soft">
                {new Date(m.receivedAt).toLocaleString()} · to {m.to.join(", ")}
              </p>
              <p className="text-lg font-semibold text-ink">{m.subject}</p>
              <pre className="mt-2 whitespace-pre-wrap font-sans text-sm text-ink">
                <Linked text={m.text} />
              </pre>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
