// Every moderation action on a build (and re-check flips), newest first. Moderators only.

type Entry = { action: string; detail: unknown; createdAt: Date; actorName: string | null };

const WORDS: Record<string, string> = {
  endorse: "endorsed it", withdraw: "withdrew the endorsement", hide: "hid it", unhide: "showed it again",
  "thread-add": "attached a thread", "thread-remove": "detached a thread", recheck: "Re-check", "owner-edit": "edited it (owner)",
};

function detailText(e: Entry): string {
  const d = (e.detail ?? {}) as { reason?: string; url?: string; fits?: boolean; fields?: string[] };
  if (e.action === "recheck") return `${d.fits ? "fits again" : "no longer fits"}${d.reason ? ` — ${d.reason}` : ""}`;
  if (d.reason) return `: ${d.reason}`;
  if (d.url) return `: ${d.url}`;
  if (d.fields) return `: ${d.fields.join(", ")}`;
  return "";
}

export function AuditLog({ entries }: { entries: Entry[] }) {
  if (!entries.length) return <p className="text-sm text-muted">No moderation actions yet.</p>;
  return (
    <ol className="space-y-2 text-sm">
      {entries.map((e, i) => (
        <li key={i} className="border-l-2 border-line pl-3">
          <div className="text-xs text-muted num"><time dateTime={e.createdAt.toISOString()}>{e.createdAt.toISOString().slice(0, 16).replace("T", " ")} UTC</time></div>
          <div className="break-words">
            <span className="font-medium text-ink">{e.action === "recheck" ? "Catalog re-check:" : e.actorName ?? "Someone"}</span>{" "}
            {e.action === "recheck" ? "" : WORDS[e.action] ?? e.action}{detailText(e)}
          </div>
        </li>
      ))}
    </ol>
  );
}
