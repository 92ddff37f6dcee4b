"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage, Input } from "@/components/ui/field";
import { fetchJson } from "@/components/api-client";

type Key = { id: string; name: string; start: string; createdAt: string | Date; lastUsedAt: string | Date | null };

export function ApiKeysPanel({ shopSlug, keys, origin }: { shopSlug: string; keys: Key[]; origin: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [secret, setSecret] = useState<string | null>(null);
  const [msg, setMsg] = useState<string | null>(null);
  const day = (d: string | Date | null) => (d ? new Date(d).toLocaleDateString("en-GB") : "never");

  async function create(e: React.FormEvent) {
    e.preventDefault(); setMsg(null);
    try {
      const res = await fetchJson<{ key: { secret: string } }>(`/api/v1/shops/${shopSlug}/api-keys`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ name }) });
      setSecret(res.key.secret); setName(""); router.refresh();
    } catch (err) { setMsg((err as Error).message); }
  }
  async function revoke(k: Key) {
    if (!confirm(`Revoke "${k.name}"? Systems using it stop at once.`)) return;
    try { await fetchJson(`/api/v1/shops/${shopSlug}/api-keys/${k.id}`, { method: "DELETE" }); router.refresh(); }
    catch (err) { setMsg((err as Error).message); }
  }

  return (
    <div className="space-y-5">
      {msg ? <FormMessage>{msg}</FormMessage> : null}
      {secret ? (
        <div role="status" className="rounded-lg border-2 border-ok/50 bg-ok/5 p-4">
          <p className="font-semibold text-ink">Copy this key now: it is shown only once.</p>
          <p className="code mt-2 break-all rounded bg-bg px-2 py-1.5 text-sm">{secret}</p>
          <p className="mt-2 text-sm text-muted">Your system sends it as <span className="code">Authorization: Bearer …</span> to <span className="code">GET/PUT {origin}/api/v1/shops/{shopSlug}/inventory</span>. It works for this shop&apos;s stock and nothing else.</p>
        </div>
      ) : null}
      <form onSubmit={create} className="rounded-lg border border-line bg-surface p-4">
        <label htmlFor="key-name" className="block font-medium text-ink">New key</label>
        <div className="mt-2 flex flex-col gap-2 sm:flex-row">
          <Input id="key-name" value={name} onChange={(e) => setName(e.target.value)} placeholder="e.g. Counter till" maxLength={80} className="sm:max-w-sm" />
          <Button disabled={!name.trim()}>Create key</Button>
        </div>
      </form>
      <div className="overflow-x-auto rounded-lg border border-line bg-surface">
        <table className="w-full text-sm">
          <caption className="sr-only">Live API keys</caption>
          <thead className="border-b border-line bg-sunken text-left text-xs uppercase tracking-wide text-muted"><tr><th className="px-3 py-2">Name</th><th className="px-3 py-2">Starts with</th><th className="px-3 py-2">Made</th><th className="px-3 py-2">Last used</th><th className="px-3 py-2"><span className="sr-only">Actions</span></th></tr></thead>
          <tbody>
            {keys.map((k) => (
              <tr key={k.id} className="border-b border-line/60 last:border-0">
                <td className="px-3 py-2 font-medium text-ink">{k.name}</td><td className="code px-3 py-2">{k.start}…</td>
                <td className="px-3 py-2 text-muted">{day(k.createdAt)}</td><td className="px-3 py-2 text-muted">{day(k.lastUsedAt)}</td>
                <td className="px-3 py-2 text-right"><Button variant="danger" className="px-3 py-1" onClick={() => revoke(k)}>Revoke</Button></td>
              </tr>
            ))}
            {!keys.length ? <tr><td colSpan={5} className="px-3 py-5 text-center text-muted">No live keys.</td></tr> : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
