"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { partPatchSchema, type PartPatch } from "@/lib/validation/submissions";
import { callApi } from "@/components/api-client";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";

type Numbers = Pick<PartPatch, "lengthMm" | "adjustMm" | "clearApertureMm" | "weightG" | "listPriceCents">;
const num = { setValueAs: (v: string) => (v === "" ? null : Number(v)) };
const FIELDS: [keyof Numbers, string][] = [
  ["lengthMm", "Optical length (mm)"], ["adjustMm", "Adjustable by (mm)"], ["clearApertureMm", "Clear aperture (mm)"],
  ["weightG", "Weight (g)"], ["listPriceCents", "List price (cents)"],
];

/** Moderators correct a catalog part's numbers; builds that use it re-check themselves. */
export function CorrectPartForm({ slug, initial }: { slug: string; initial: Numbers }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [message, setMessage] = useState<{ tone: "ok" | "bad"; text: string } | null>(null);
  const { register, handleSubmit, setError, formState: { errors, isSubmitting, dirtyFields } } = useForm<Numbers>({
    resolver: zodResolver(partPatchSchema as never) as unknown as Resolver<Numbers>, defaultValues: initial,
  });
  async function onSubmit(values: Numbers) {
    const changed = Object.fromEntries(Object.entries(values).filter(([k]) => dirtyFields[k as keyof Numbers]));
    if (!Object.keys(changed).length) { setMessage({ tone: "bad", text: "Nothing changed." }); return; }
    const res = await callApi<{ recheck: { queued: number } }>("PATCH", `/api/v1/parts/${encodeURIComponent(slug)}`, changed);
    if (!res.ok) {
      for (const [k, v] of Object.entries(res.fields ?? {})) setError(k as keyof Numbers, { message: v[0] });
      setMessage({ tone: "bad", text: res.message });
      return;
    }
    const n = res.data.recheck.queued;
    setMessage({ tone: "ok", text: n ? `Saved. ${n} build${n === 1 ? "" : "s"} that use it are being re-checked; their pages show the verdict within seconds.` : "Saved. No saved build uses this part." });
    router.refresh();
  }
  if (!open) return <Button variant="secondary" onClick={() => setOpen(true)}>Correct the numbers</Button>;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-4 rounded-lg border border-line bg-surface p-5">
      <h2 className="font-semibold text-ink">Correct this part (moderators)</h2>
      {message ? <FormMessage tone={message.tone}>{message.text}</FormMessage> : null}
      <div className="grid gap-4 sm:grid-cols-5">
        {FIELDS.map(([k, label]) => (
          <Field key={k} label={label} htmlFor={`fix-${k}`} error={errors[k]?.message}>
            <Input id={`fix-${k}`} type="number" step="any" invalid={!!errors[k]} {...register(k, num)} />
          </Field>
        ))}
      </div>
      <div className="flex gap-2"><Button type="submit" disabled={isSubmitting}>Save correction</Button><Button type="button" variant="ghost" onClick={() => setOpen(false)}>Close</Button></div>
    </form>
  );
}
