"use client";
import Link from "next/link";
import { useRef, useState } from "react";
import { Button, ButtonLink } from "@/components/ui/button";
import { Field, FormMessage, Input, inputClass } from "@/components/ui/field";
import { htmlSnippet, markdownSnippet } from "@/lib/builds/snippets";
import type { BuildVisibility } from "@/lib/validation/builds";
import { callApi } from "@/components/api-client";
import { SharePanel } from "./share-panel";
import { VisibilityChoice } from "./visibility-choice";

type Saved = { slug: string; url: string; visibility: BuildVisibility; title: string };

/**
 * "Save as link" for the planner: saves the chosen solution of `request` (the body of
 * POST /api/v1/solve) as a build. The server solves it again; nothing else is trusted.
 */
export function SaveBuildButton({ request, solutionIndex, signedIn, defaultTitle = "", className = "" }: {
  request: object | null; solutionIndex: number; signedIn: boolean; defaultTitle?: string; className?: string;
}) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [form, setForm] = useState({ title: defaultTitle, notes: "", visibility: "unlisted" as BuildVisibility });
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; fields: Record<string, string[]> } | null>(null);
  const [saved, setSaved] = useState<Saved | null>(null);
  const [signInHref, setSignInHref] = useState("/sign-in");

  function open() {
    setSignInHref(`/sign-in?next=${encodeURIComponent(window.location.pathname + window.location.search)}`);
    setError(null);
    if (saved) { setSaved(null); setForm({ title: defaultTitle, notes: "", visibility: "unlisted" }); }
    dialog.current?.showModal();
  }

  async function save(e: React.FormEvent) {
    e.preventDefault();
    if (!request) return;
    setBusy(true); setError(null);
    const res = await callApi<{ slug: string; url: string }>("POST", "/api/v1/builds", {
      title: form.title, ...(form.notes.trim() ? { notes: form.notes } : {}), visibility: form.visibility, request, solutionIndex,
    });
    setBusy(false);
    if (!res.ok) {
      if (res.status === 401) { setError({ message: "Your session has ended: sign in again to save.", fields: {} }); return; }
      setError({ message: res.message, fields: res.fields ?? {} });
      return;
    }
    setSaved({ ...res.data, visibility: form.visibility, title: form.title });
  }

  const snippet = saved && { title: saved.title, url: saved.url, imageUrl: `${saved.url}/opengraph-image`, endorsed: false };
  return (
    <>
      <Button type="button" onClick={open} disabled={!request} className={className}>Save as link</Button>
      <dialog ref={dialog} aria-labelledby="save-build-title"
        className="m-auto w-[min(36rem,calc(100vw-2rem))] rounded-lg border border-line bg-surface p-0 text-text shadow-xl backdrop:bg-ink/50 night:backdrop:bg-black/80">
        <div className="space-y-4 p-5">
          <div className="flex items-start justify-between gap-4">
            <h2 id="save-build-title" className="text-lg font-semibold text-ink">{saved ? "Saved: here is your link" : "Save this train as a link"}</h2>
            <button type="button" onClick={() => dialog.current?.close()} className="rounded px-2 text-xl leading-none text-muted hover:text-ink" aria-label="Close">×</button>
          </div>
          {!signedIn ? (
            <div className="space-y-3">
              <p className="text-sm">Sign in to save this train as a build with a short link you can keep and share. Your plan stays as it is and comes back after signing in.</p>
              <div className="flex gap-2">
                <ButtonLink href={signInHref}>Sign in to save</ButtonLink>
                <ButtonLink href="/sign-up" variant="secondary">Create an account</ButtonLink>
              </div>
            </div>
          ) : saved && snippet ? (
            <div className="space-y-4">
              <p className="text-sm text-muted">Trainyard solved the plan again and stored that answer. {saved.visibility === "private" ? "Only you (and moderators) can open it." : saved.visibility === "unlisted" ? "Anyone with the link can open it." : "It is listed under Builds."}</p>
              <SharePanel url={saved.url} markdown={markdownSnippet(snippet)} html={htmlSnippet(snippet)} previewable={saved.visibility !== "private"} />
              <div className="flex flex-wrap gap-2">
                <ButtonLink href={`/b/${saved.slug}`}>Open the build page</ButtonLink>
                <ButtonLink href={`/quotes/new?build=${saved.slug}`} variant="secondary">Ask a shop for a quote</ButtonLink>
                <Button type="button" variant="ghost" onClick={() => dialog.current?.close()}>Back to the planner</Button>
              </div>
            </div>
          ) : (
            <form onSubmit={save} className="space-y-4" noValidate>
              {error ? <FormMessage>{error.message}</FormMessage> : null}
              <Field label="Title" htmlFor="build-title" error={error?.fields.title?.[0]}>
                <Input id="build-title" value={form.title} maxLength={120} required autoFocus invalid={!!error?.fields.title}
                  placeholder="e.g. 80 mm ED + flattener + 7-slot wheel" onChange={(e) => setForm({ ...form, title: e.target.value })} />
              </Field>
              <Field label="Notes (optional)" htmlFor="build-notes" error={error?.fields.notes?.[0]} hint="Plain text: how it goes together, what to watch for.">
                <textarea id="build-notes" rows={4} maxLength={4000} className={inputClass} value={form.notes} onChange={(e) => setForm({ ...form, notes: e.target.value })} />
              </Field>
              <VisibilityChoice name="build-visibility" value={form.visibility} onChange={(visibility) => setForm({ ...form, visibility })} />
              <div className="flex flex-wrap items-center gap-2">
                <Button type="submit" disabled={busy || !form.title.trim()}>{busy ? "Saving…" : "Save build"}</Button>
                <span className="text-xs text-muted">Saves alternative {solutionIndex + 1}. <Link href="/builds?mine=1" className="underline underline-offset-4">Your builds</Link></span>
              </div>
            </form>
          )}
        </div>
      </dialog>
    </>
  );
}
