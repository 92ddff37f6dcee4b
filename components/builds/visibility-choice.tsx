"use client";
import type { BuildVisibility } from "@/lib/validation/builds";

const OPTIONS: { value: BuildVisibility; label: string; hint: string }[] = [
  { value: "private", label: "Private", hint: "Only you (and moderators)." },
  { value: "unlisted", label: "Unlisted", hint: "Anyone with the link; not in the list of builds." },
  { value: "public", label: "Public", hint: "Anyone, and listed under Builds." },
];

export function VisibilityChoice({ name, value, onChange }: { name: string; value: BuildVisibility; onChange: (v: BuildVisibility) => void }) {
  return (
    <fieldset className="space-y-1.5">
      <legend className="mb-1.5 text-sm font-medium text-text">Who can open it</legend>
      <div className="grid gap-2 sm:grid-cols-3">
        {OPTIONS.map((o) => (
          <label key={o.value} className={`cursor-pointer rounded-md border px-3 py-2 text-sm transition-colors has-[input:focus-visible]:ring-2 has-[input:focus-visible]:ring-brass ${value === o.value ? "border-brass bg-brass/10" : "border-line bg-surface hover:border-brass/60"}`}>
            <input type="radio" name={name} value={o.value} checked={value === o.value} onChange={() => onChange(o.value)} className="sr-only" />
            <span className="block font-medium text-ink">{o.label}</span>
            <span className="block text-xs text-muted">{o.hint}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
