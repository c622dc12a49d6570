"use client";
// A program's members: directors invite by e-mail, change roles, remove members, resend or withdraw invitations.
import { useState, type FormEvent } from "react";
import { Breadcrumbs } from "@/components/Breadcrumbs";
import { Button } from "@/components/Button";
import { Card } from "@/components/Card";
import { ErrorState } from "@/components/ErrorState";
import { ApiError, sendJson } from "@/components/fetcher";
import { FormMessage } from "@/components/FormMessage";
import { PageTitle } from "@/components/PageTitle";
import { RoleBadge, ROLE_WORDS } from "@/components/RoleBadge";
import { TextField } from "@/components/TextField";
import { useApi } from "@/components/use-api";
import { ROLES, type Role } from "@/lib/auth/permissions";

type Member = { userId: string; name: string; email: string; role: Role };
type Invitation = { id: string; email: string; role: Role; expiresAt: string; sentAt: string };

const ROLE_HINT: Record<Role, string> = {
  director: "members, music, balance plans, everything",
  designer: "roster, sets, positions, imports",
  staff: "reads every screen, records box readings, prints sheets",
};

export function MembersView({ programId }: { programId: string }) {
  const members = useApi<{ role: Role; members: Member[] }>(`/api/programs/${programId}/members`);
  const program = useApi<{ program: { name: string } }>(`/api/programs/${programId}`);
  const isDirector = members.data?.role === "director";
  const invitations = useApi<{ invitations: Invitation[] }>(isDirector ? `/api/programs/${programId}/invitations` : null);
  const [message, setMessage] = useState<{ tone: "info" | "bad"; text: string } | null>(null);
  // Read once when the page opens: whether an invitation has lapsed need not tick while the page is open.
  const [now] = useState(Date.now);

  async function act(run: () => Promise<unknown>, done: string) {
    setMessage(null);
    try {
      await run();
      setMessage({ tone: "info", text: done });
      await Promise.all([members.mutate(), invitations.mutate()]);
    } catch (err) {
      setMessage({ tone: "bad", text: err instanceof ApiError ? err.message : "Something went wrong." });
    }
  }

  if (members.error) return <ErrorState error={members.error} what="program" onRetry={() => members.mutate()} />;
  const name = program.data?.program.name ?? "Program";
  return (
    <>
      <Breadcrumbs items={[{ label: "Programs", href: "/programs" }, { label: name, href: `/programs/${programId}` }, { label: "Members" }]} />
      <PageTitle sub="Who works on this program's shows, and what each may do.">Members</PageTitle>
      <FormMessage id="members-status" tone={message?.tone ?? "info"}>
        {message?.text ?? ""}
      </FormMessage>
      <div className="mt-2 grid items-start gap-6 lg:grid-cols-[3fr_2fr]">
        <Card title="People in this program" titleId="members-title">
          {!members.data ? (
            <p role="status">Loading members…</p>
          ) : (
            <table className="w-full text-left">
              <thead>
                <tr className="border-b border-ink/15 text-sm text-ink-soft">
                  <th className="py-2 pr-3 font-semibold">Name</th>
                  <th className="py-2 pr-3 font-semibold">Role</th>
                  {isDirector ? <th className="py-2 font-semibold"><span className="sr-only">Actions</span></th> : null}
                </tr>
              </thead>
              <tbody>
                {members.data.members.map((m) => (
                  <tr key={m.userId} className="border-b border-ink/10 align-middle">
                    <td className="py-3 pr-3">
                      <span className="font-semibold text-ink">{m.name}</span>
                      <br />
                      <span className="text-sm text-ink-soft">{m.email}</span>
                    </td>
                    <td className="py-3 pr-3">
                      {isDirector ? (
                        <select
                          aria-label={`Role of ${m.name}`}
                          className="min-h-11 rounded-lg border border-ink/30 bg-paper-raised px-2"
                          value={m.role}
                          onChange={(e) => act(() => sendJson(`/api/programs/${programId}/members/${m.userId}`, "PATCH", { role: e.target.value }), `${m.name} is now ${ROLE_WORDS[e.target.value as Role].toLowerCase()}.`)}
                        >
                          {ROLES.map((r) => (
                            <option key={r} value={r}>
                              {ROLE_WORDS[r]}
                            </option>
                          ))}
                        </select>
                      ) : (
                        <RoleBadge role={m.role} />
                      )}
                    </td>
                    {isDirector ? (
                      <td className="py-3 text-right">
                        <Button variant="quiet" onClick={() => confirm(`Remove ${m.name} from this program?`) && act(() => sendJson(`/api/programs/${programId}/members/${m.userId}`, "DELETE"), `${m.name} was removed.`)}>
                          Remove
                        </Button>
                      </td>
                    ) : null}
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </Card>
        {isDirector ? (
          <div className="space-y-6">
            <InviteCard programId={programId} onSent={(text) => act(async () => {}, text)} />
            <Card title="Invitations not yet accepted" titleId="invitations-title">
              {!invitations.data?.invitations.length ? (
                <p className="text-ink-soft">None open.</p>
              ) : (
                <ul className="space-y-3">
                  {invitations.data.invitations.map((i) => {
                    const expired = new Date(i.expiresAt).getTime() < now;
                    return (
                      <li key={i.id} className="rounded-lg border border-ink/15 p-3">
                        <p className="font-semibold text-ink">{i.email}</p>
                        <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
                          <RoleBadge role={i.role} /> {expired ? "expired" : `until ${new Date(i.expiresAt).toLocaleDateString()}`}
                        </p>
                        <div className="mt-2 flex gap-2">
                          <Button variant="secondary" onClick={() => act(() => sendJson(`/api/programs/${programId}/invitations/${i.id}/resend`, "POST"), `A new link went to ${i.email}.`)}>
                            Resend
                          </Button>
                          <Button variant="quiet" onClick={() => act(() => sendJson(`/api/programs/${programId}/invitations/${i.id}`, "DELETE"), `The invitation to ${i.email} was withdrawn.`)}>
                            Withdraw
                          </Button>
                        </div>
                      </li>
                    );
                  })}
                </ul>
              )}
            </Card>
          </div>
        ) : null}
      </div>
    </>
  );
}

function InviteCard({ programId, onSent }: { programId: string; onSent: (text: string) => void }) {
  const [error, setError] = useState<ApiError | null>(null);
  const [busy, setBusy] = useState(false);
  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = e.currentTarget;
    const data = new FormData(form);
    setBusy(true);
    setError(null);
    try {
      const res = await sendJson<{ mailed: boolean }>(`/api/programs/${programId}/invitations`, "POST", { email: data.get("email"), role: data.get("role") });
      form.reset();
      onSent(res!.mailed ? `An invitation went to ${data.get("email")}.` : "The invitation is saved, but the e-mail could not be sent: try Resend.");
    } catch (err) {
      setError(err as ApiError);
    } finally {
      setBusy(false);
    }
  }
  return (
    <Card title="Invite someone" titleId="invite-title">
      <form onSubmit={submit} className="space-y-4" noValidate>
        <TextField id="invite-email" name="email" type="email" label="E-mail" required errors={error?.issues.email ?? []} />
        <fieldset>
          <legend className="font-semibold text-ink">Role</legend>
          {ROLES.map((r) => (
            <label key={r} className="mt-2 flex min-h-11 items-start gap-3">
              <input type="radio" name="role" value={r} defaultChecked={r === "staff"} className="mt-1.5 h-5 w-5" />
              <span>
                <span className="font-semibold">{ROLE_WORDS[r]}</span> <span className="text-ink-soft">— {ROLE_HINT[r]}</span>
              </span>
            </label>
          ))}
        </fieldset>
        <FormMessage id="invite-status" tone="bad">
          {error && !error.issues.email ? error.message : ""}
        </FormMessage>
        <Button type="submit" disabled={busy}>
          Send the invitation
        </Button>
      </form>
    </Card>
  );
}
