"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input, inputClass } from "@/components/ui/field";
import type { BuildVisibility } from "@/lib/validation/builds";
import { callApi } from "@/components/api-client";
import { VisibilityChoice } from "./visibility-choice";

/** The owner's controls: title, notes and visibility, or delete. Nothing else of a build changes. */
export function OwnerPanel({ slug, title, notes, visibility, deleteOnly = false }: {
  slug: string; title: string; notes: string | null; visibility: BuildVisibility; deleteOnly?: boolean;
}) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "bad" | "ok"; text: string } | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [form, setForm] = useState({ title, notes: notes ?? "", visibility });

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true); setMessage(null); setFields({});
    const res = await callApi("PATCH", `/api/v1/builds/${slug}`, { title: form.title, notes: form.notes.trim() ? form.notes : null, visibility: form.visibility });
    setBusy(false);
    if (!res.ok) { setMessage({ tone: "bad", text: res.message }); setFields(res.fields ?? {}); return; }
    setEditing(false);
    setMessage({ tone: "ok", text: "Saved." });
    router.refresh();
  }

  async function remove() {
    if (!window.confirm("Delete this build? Its link will stop working for everyone.")) return;
    setBusy(true);
    const res = await callApi("DELETE", `/api/v1/builds/${slug}`);
    setBusy(false);
    if (!res.ok) { setMessage({ tone: "bad", text: res.message }); return; }
    router.push(deleteOnly ? "/review/builds" : "/builds?mine=1");
    router.refresh();
  }

  if (!editing) {
    return (
      <div className="space-y-3">
        {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
        <div className="flex flex-wrap gap-2">
          {deleteOnly ? null : <Button variant="secondary" onClick={() => { setEditing(true); setMessage(null); }}>Edit title, notes, visibility</Button>}
          <Button variant="danger" onClick={remove} disabled={busy}>Delete build</Button>
        </div>
      </div>
    );
  }
  return (
    <form onSubmit={save} className="space-y-4" noValidate>
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      <Field label="Title" htmlFor="edit-title" error={fields.title?.[0]}>
        <Input id="edit-title" value={form.title} maxLength={120} invalid={!!fields.title} onChange={(e) => setForm({ ...form, title: e.target.value })} />
      </Field>
      <Field label="Notes" htmlFor="edit-notes" error={fields.notes?.[0]} hint="Plain text: how it is assembled, what to watch for.">
        <textarea id="edit-notes" rows={5} maxLength={4000} className={inputClass} value={form.notes} onChange={(e) => setForm({ ...form, notes: e.target.value })} />
      </Field>
      <VisibilityChoice name="edit-visibility" value={form.visibility} onChange={(visibility) => setForm({ ...form, visibility })} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={busy}>{busy ? "Saving…" : "Save changes"}</Button>
        <Button type="button" variant="ghost" onClick={() => { setEditing(false); setForm({ title, notes: notes ?? "", visibility }); }}>Cancel</Button>
      </div>
    </form>
  );
}
