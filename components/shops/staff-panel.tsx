"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage, Input } from "@/components/ui/field";
import { fetchJson } from "@/components/api-client";

type Member = { id: string; name: string; email: string; role: "owner" | "staff" };
type Invite = { id: string; email: string; expiresAt: string | Date };

export function StaffPanel({ shopSlug, members, invitations, isOwner, selfId }: { shopSlug: string; members: Member[]; invitations: Invite[]; isOwner: boolean; selfId: string }) {
  const router = useRouter();
  const [email, setEmail] = useState("");
  const [msg, setMsg] = useState<{ tone: "ok" | "bad"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function call(url: string, init: RequestInit, ok: string) {
    setBusy(true); setMsg(null);
    try { await fetchJson(url, init); setMsg({ tone: "ok", text: ok }); router.refresh(); return true; }
    catch (err) { setMsg({ tone: "bad", text: (err as Error).message }); return false; }
    finally { setBusy(false); }
  }

  return (
    <div className="space-y-5">
      {msg ? <FormMessage tone={msg.tone}>{msg.text}</FormMessage> : null}
      <div className="overflow-hidden rounded-lg border border-line bg-surface">
        <ul className="divide-y divide-line/70">
          {members.map((m) => (
            <li key={m.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
              <div>
                <p className="font-medium text-ink">{m.name}{m.id === selfId ? <span className="ml-1 text-xs text-muted">(you)</span> : null}</p>
                <p className="text-sm text-muted">{m.email}</p>
              </div>
              <div className="flex items-center gap-3">
                <span className={`rounded px-2 py-0.5 text-xs font-medium uppercase tracking-wide ${m.role === "owner" ? "bg-brass/20 text-brass-ink" : "bg-glass/15 text-glass-ink"}`}>{m.role}</span>
                {isOwner && m.role !== "owner" ? (
                  <Button variant="danger" className="px-3 py-1" disabled={busy}
                    onClick={() => { if (confirm(`Remove ${m.name} from the shop?`)) void call(`/api/v1/shops/${shopSlug}/members/${m.id}`, { method: "DELETE" }, `${m.name} no longer belongs to the shop.`); }}>Remove</Button>
                ) : null}
              </div>
            </li>
          ))}
        </ul>
      </div>
      {invitations.length ? (
        <div>
          <h2 className="mb-1.5 text-sm font-semibold text-ink">Invitations waiting</h2>
          <ul className="space-y-1 text-sm">{invitations.map((i) => <li key={i.id} className="flex justify-between rounded-md border border-line bg-surface px-3 py-2"><span>{i.email}</span><span className="text-muted">until {new Date(i.expiresAt).toLocaleDateString("en-GB")}</span></li>)}</ul>
        </div>
      ) : null}
      {isOwner ? (
        <form className="rounded-lg border border-line bg-surface p-4" onSubmit={async (e) => { e.preventDefault(); if (await call(`/api/v1/shops/${shopSlug}/members`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email }) }, `Invitation sent to ${email}.`)) setEmail(""); }}>
          <label htmlFor="invite-email" className="block font-medium text-ink">Invite staff by e-mail</label>
          <p className="mt-1 text-sm text-muted">They get a link; once they sign in with that address and accept, they can edit stock and answer quotes. Only you, the owner, can add or remove people.</p>
          <div className="mt-3 flex flex-col gap-2 sm:flex-row">
            <Input id="invite-email" type="email" required value={email} onChange={(e) => setEmail(e.target.value)} placeholder="name@example.org" className="sm:max-w-sm" />
            <Button disabled={busy || !email}>Send invitation</Button>
          </div>
        </form>
      ) : <p className="text-sm text-muted">The owner adds and removes staff.</p>}
    </div>
  );
}
