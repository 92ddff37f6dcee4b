"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useState } from "react";
import { useForm, type FieldErrors, type Resolver } from "react-hook-form";
import { KIND_LABELS } from "@/lib/format";
import { INTERFACES, interfaceLabel } from "@/lib/interfaces";
import { FILTER_SIZES, OPTICS_ROLES, PART_KINDS, partFormSchema, type PartInput } from "@/lib/validation/parts";
import { humanIssue } from "@/lib/validation/messages";
import { apiRequest } from "@/components/api-client";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input, inputClass } from "@/components/ui/field";

type FormValues = PartInput & { front: { interface: string; gender: "male" | "female" } | null; rear: { interface: string; gender: "male" | "female" } | null };
const num = { setValueAs: (v: string) => (v === "" || v === undefined ? undefined : Number(v)) };

function errorAt(errors: FieldErrors<FormValues>, path: string): string | undefined {
  let cur: unknown = errors;
  for (const k of path.split(".")) cur = (cur as Record<string, unknown> | undefined)?.[k];
  return (cur as { message?: string } | undefined)?.message;
}

export function SubmitPartForm() {
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [result, setResult] = useState<{ ok: boolean; text: string; slug?: string } | null>(null);
  const { register, handleSubmit, watch, setError, formState: { errors, isSubmitting } } = useForm<FormValues>({
    resolver: zodResolver(partFormSchema as never, { error: humanIssue } as never) as unknown as Resolver<FormValues>,
    defaultValues: { kind: "adapter", reversible: false, front: { interface: "", gender: "female" }, rear: { interface: "", gender: "male" }, specs: {} },
  });
  const kind = watch("kind");

  async function onSubmit(values: FormValues) {
    setResult(null);
    if (!file) { setFileError("Attach the maker's spec sheet (PDF, PNG or JPEG, at most 10 MB)."); return; }
    if (file.size > 10 * 1024 * 1024) { setFileError("The spec sheet is larger than 10 MB."); return; }
    const body = new FormData();
    body.set("part", JSON.stringify(values));
    body.set("specSheet", file);
    const res = await apiRequest<{ slug: string; probableDuplicateOf: string | null }>("/api/v1/submissions", { method: "POST", body });
    if (!res.ok || !res.data) {
      const fields = Object.entries(res.ok ? {} : res.fields ?? {});
      for (const [path, msgs] of fields) {
        if (path === "specSheet") setFileError(msgs[0]); else setError(path as never, { message: msgs[0] });
      }
      // Each field's message shows beside it; the top line only points there, so nothing reads twice.
      setResult({ ok: false, text: fields.length ? "Nothing was sent yet: see the marked fields below." : res.ok ? "The server sent an answer that is not JSON." : res.message });
      return;
    }
    const json = res.data;
    setResult({ ok: true, slug: json.slug, text: json.probableDuplicateOf
      ? `Thank you. A moderator will check it; it looks like "${json.probableDuplicateOf}" already in the catalog, so they will compare the two.`
      : "Thank you. A moderator will check it; you will get an e-mail either way." });
  }

  if (result?.ok) return <FormMessage tone="ok">{result.text} <Link className="underline" href="/parts">Back to the catalog</Link></FormMessage>;

  const face = (side: "front" | "rear", label: string) => (
    <fieldset className="space-y-2 rounded-md border border-line p-3">
      <legend className="px-1 text-sm font-medium">{label}</legend>
      <div className="grid grid-cols-[1fr_auto] gap-2">
        <select aria-label={`${label} interface`} className={inputClass} {...register(`${side}.interface` as const)}>
          <option value="">No face here</option>
          {INTERFACES.map((i) => <option key={i.code} value={i.code}>{interfaceLabel(i.code)}</option>)}
        </select>
        <select aria-label={`${label} gender`} className={inputClass} {...register(`${side}.gender` as const)}>
          <option value="male">male</option><option value="female">female</option>
        </select>
      </div>
      {errorAt(errors, side) ? <p className="text-sm text-bad">{errorAt(errors, side)}</p> : null}
    </fieldset>
  );
  const choiceField = (path: string, label: string, choices: readonly string[]) => (
    <Field label={label} htmlFor={path} error={errorAt(errors, path)}>
      <select id={path} className={inputClass} {...register(path as never)}><option value="">Choose…</option>{choices.map((c) => <option key={c} value={c}>{c}</option>)}</select>
    </Field>
  );
  const numberField = (path: string, label: string, hint?: string) => (
    <Field label={label} htmlFor={path} error={errorAt(errors, path)} hint={hint}>
      <Input id={path} inputMode="decimal" type="number" step="any" invalid={!!errorAt(errors, path)} {...register(path as never, num)} />
    </Field>
  );

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="space-y-6">
      {result && !result.ok ? <FormMessage>{result.text}</FormMessage> : null}
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Kind" htmlFor="kind" error={errorAt(errors, "kind")}>
          <select id="kind" className={inputClass} {...register("kind")}>{PART_KINDS.map((k) => <option key={k} value={k}>{KIND_LABELS[k]}</option>)}</select>
        </Field>
        <Field label="Maker" htmlFor="maker" error={errorAt(errors, "maker")}><Input id="maker" invalid={!!errors.maker} {...register("maker")} /></Field>
        <Field label="Model" htmlFor="model" error={errorAt(errors, "model")}><Input id="model" invalid={!!errors.model} {...register("model")} /></Field>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">{face("front", "Sky side (front)")}{face("rear", "Sensor side (rear)")}</div>
      <div className="grid gap-4 sm:grid-cols-4">
        {numberField("lengthMm", "Optical length (mm)", kind === "camera" ? "Joint plane to sensor" : "Between its two joint planes")}
        {numberField("adjustMm", "Adjustable by (mm)", "Leave empty if fixed")}
        {numberField("clearApertureMm", "Clear aperture (mm)")}
        {numberField("weightG", "Weight (g)")}
      </div>
      <label className="flex items-center gap-2 text-sm"><input type="checkbox" {...register("reversible")} /> Can be mounted either way round</label>
      {kind === "optics" ? (
        <div className="grid gap-4 sm:grid-cols-4">
          {choiceField("specs.opticsRole", "Role", OPTICS_ROLES)}
          {numberField("specs.focalLengthMm", "Focal length (mm)")}
          {numberField("specs.apertureMm", "Aperture (mm)")}
          {numberField("specs.backFocusMm", "Back focus (mm)")}
          {numberField("specs.backFocusToleranceMm", "Back focus tolerance (± mm)")}
          {numberField("specs.reduction", "Focal length factor", "0.8 for a 0.8× reducer")}
          {numberField("specs.imageCircleMm", "Corrected image circle (mm)")}
          {numberField("specs.maxLoadG", "Focuser load limit (g)")}
        </div>) : null}
      {kind === "camera" ? (
        <div className="grid gap-4 sm:grid-cols-4">
          {numberField("specs.sensorWidthMm", "Sensor width (mm)")}
          {numberField("specs.sensorHeightMm", "Sensor height (mm)")}
          {numberField("specs.pixelSizeUm", "Pixel size (µm)")}
          {numberField("specs.windowThicknessMm", "Window thickness (mm)")}
        </div>) : null}
      {kind === "filter-wheel" || kind === "filter-drawer" ? (
        <div className="grid gap-4 sm:grid-cols-3">
          {choiceField("specs.filterSize", "Filter size", FILTER_SIZES)}
          {numberField("specs.slots", "Slots")}
          {numberField("specs.filterThicknessMm", "Filter thickness (mm)")}
        </div>) : null}
      <Field label="Notes for the moderator" htmlFor="description" error={errorAt(errors, "description")}>
        <textarea id="description" rows={3} className={inputClass} {...register("description")} />
      </Field>
      <Field label="Spec sheet (PDF, PNG or JPEG, at most 10 MB)" htmlFor="specSheet" error={fileError ?? undefined}>
        <input id="specSheet" type="file" accept="application/pdf,image/png,image/jpeg" className="block text-sm"
          onChange={(e) => { setFile(e.target.files?.[0] ?? null); setFileError(null); }} />
      </Field>
      <Button type="submit" disabled={isSubmitting}>{isSubmitting ? "Sending…" : "Send for review"}</Button>
    </form>
  );
}
