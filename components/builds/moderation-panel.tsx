"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage, Input } from "@/components/ui/field";
import { callApi } from "@/components/api-client";

/**
 * A moderator's controls for one build: endorse or withdraw, hide with a reason or show again,
 * attach forum threads. Each button calls the JSON API, which re-checks the role.
 */
export function ModerationPanel({ slug, endorsed, hidden, threads, compact = false }: {
  slug: string; endorsed: boolean; hidden: boolean; threads: string[]; compact?: boolean;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);
  const [reason, setReason] = useState("");
  const [hiding, setHiding] = useState(false);
  const [thread, setThread] = useState("");

  async function act(key: string, method: "POST" | "DELETE", path: string, body: unknown, done: string) {
    setBusy(key); setMessage(null);
    const res = await callApi(method, `/api/v1/builds/${slug}${path}`, body);
    setBusy(null);
    if (!res.ok) { setMessage({ tone: "bad", text: res.fields ? Object.values(res.fields).flat()[0] ?? res.message : res.message }); return false; }
    setMessage({ tone: "ok", text: done });
    router.refresh();
    return true;
  }

  return (
    <div className="space-y-3">
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      <div className="flex flex-wrap items-center gap-2">
        {endorsed ? (
          <Button variant="secondary" disabled={!!busy} onClick={() => act("endorse", "DELETE", "/endorse", undefined, "Endorsement withdrawn.")}>
            {busy === "endorse" ? "Withdrawing…" : "Withdraw endorsement"}
          </Button>
        ) : hidden ? null : (
          // A hidden build is not a reference for anyone: show it again before endorsing it.
          <Button disabled={!!busy} onClick={() => act("endorse", "POST", "/endorse", undefined, "Endorsed as a reference build.")}>
            {busy === "endorse" ? "Endorsing…" : "Endorse as reference"}
          </Button>
        )}
        {hidden ? (
          <Button variant="secondary" disabled={!!busy} onClick={() => act("hide", "DELETE", "/hide", undefined, "Shown again.")}>Show again</Button>
        ) : !hiding ? (
          <Button variant="danger" disabled={!!busy} onClick={() => setHiding(true)}>Hide…</Button>
        ) : null}
      </div>
      {hiding && !hidden ? (
        <form className="flex flex-wrap items-center gap-2" onSubmit={async (e) => {
          e.preventDefault();
          if (await act("hide", "POST", "/hide", { reason }, "Hidden from everyone but the owner and moderators.")) { setHiding(false); setReason(""); }
        }}>
          <Input aria-label="Why hide it" placeholder="Why hide it (the owner sees this)" value={reason} onChange={(e) => setReason(e.target.value)} className="min-w-0 flex-1" maxLength={500} required />
          <Button type="submit" variant="danger" disabled={!!busy || reason.trim().length < 3}>Hide build</Button>
          <Button type="button" variant="ghost" onClick={() => setHiding(false)}>Cancel</Button>
        </form>
      ) : null}
      <form className="flex flex-wrap items-center gap-2" onSubmit={async (e) => {
        e.preventDefault();
        if (await act("thread", "POST", "/threads", { url: thread }, "Thread attached.")) setThread("");
      }}>
        <Input type="url" aria-label="Forum thread address" placeholder="https://forum.example/thread/…" value={thread} onChange={(e) => setThread(e.target.value)} className="min-w-0 flex-1" />
        <Button type="submit" variant="secondary" disabled={!!busy || !thread.trim()}>Attach thread</Button>
      </form>
      {!compact && threads.length ? (
        <ul className="space-y-1 text-sm">
          {threads.map((t) => (
            <li key={t} className="flex items-center justify-between gap-2">
              <a href={t} rel="nofollow noopener noreferrer" target="_blank" className="truncate text-brass-ink underline-offset-4 hover:underline">{t}</a>
              <button type="button" className="shrink-0 text-xs text-muted hover:text-bad" disabled={!!busy}
                onClick={() => act("thread", "DELETE", "/threads", { url: t }, "Thread detached.")}>Detach</button>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
