"use client";
// One chosen part in the left column: its name, faces and the numbers that matter here.
import type { ReactNode } from "react";
import type { ApiPart } from "@/lib/catalog/part-json";
import { formatLength, type LengthUnit } from "@/lib/units";
import { getInterface, interfaceHue, interfaceLabel } from "@/lib/interfaces";
import { ApiError } from "@/components/api-client";
import { usePart } from "./api";
import { useLengthUnit } from "./length-unit";
import { roleOf } from "./part-combobox";

type Extra = { focalLengthMm?: number; backFocusMm?: number; backFocusToleranceMm?: number; focalRatio?: number;
  sensorWidthMm?: number; sensorHeightMm?: number; pixelSizeUm?: number; opticsRole?: string };

function facts(p: ApiPart & Extra, unit: LengthUnit): string[] {
  const len = (mm: number) => formatLength(mm, unit);
  const out: string[] = [];
  if (p.kind === "optics") {
    if (p.focalLengthMm) out.push(`${p.focalLengthMm} mm${p.focalRatio ? ` f/${p.focalRatio}` : ""}`);
    if (p.backFocusMm !== undefined) out.push(unit === "mm" ? `back focus ${p.backFocusMm} ± ${p.backFocusToleranceMm ?? 0.5} mm` : `back focus ${len(p.backFocusMm)} ± ${len(p.backFocusToleranceMm ?? 0.5)}`);
    else if (p.opticsRole === "telescope") out.push("no back focus of its own");
  } else if (p.kind === "camera") {
    out.push(`${len(p.lengthMm)} to the sensor`);
    if (p.sensorWidthMm && p.sensorHeightMm) out.push(`${p.sensorWidthMm} × ${p.sensorHeightMm} mm sensor`);
    if (p.pixelSizeUm) out.push(`${p.pixelSizeUm} µm pixels`);
  } else {
    out.push(`${len(p.lengthMm)}${p.adjustMm ? ` to ${len(p.lengthMm + p.adjustMm)}` : ""}`);
  }
  return out;
}

export function ChosenPart({ slug, actions, tone = "plain" }: { slug: string; actions: ReactNode; tone?: "glass" | "station" | "plain" }) {
  const part = usePart(slug);
  const unit = useLengthUnit();
  const ring = tone === "glass" ? "border-glass/50 bg-glass/5" : tone === "station" ? "border-line bg-station" : "border-line bg-surface";
  if (part.isError) {
    const missing = part.error instanceof ApiError && part.error.status === 404;
    return (
      <div className={`rounded-md border border-bad/40 bg-bad/5 px-3 py-2 text-sm`}>
        <p className="text-bad">{missing ? <>No part <span className="code">{slug}</span> in the catalog.</> : `Could not load ${slug}: ${part.error.message}`}</p>
        <div className="mt-1.5 flex gap-2">{actions}</div>
      </div>
    );
  }
  const p = part.data as (ApiPart & Extra) | undefined;
  return (
    <div className={`rounded-md border px-3 py-2.5 ${ring}`} aria-busy={!p}>
      {p ? (
        <>
          <div className="flex items-start justify-between gap-2">
            <div className="min-w-0">
              <p className="text-[11px] font-medium uppercase tracking-wider text-muted">{roleOf(p)}</p>
              <p className="font-medium leading-snug text-ink">{p.name}</p>
            </div>
            <div className="flex shrink-0 gap-1">{actions}</div>
          </div>
          <p className="num mt-1 text-xs text-muted">{facts(p, unit).join(" · ")}</p>
          <p className="mt-1.5 flex flex-wrap items-center gap-x-2 gap-y-1 text-xs">
            {p.front ? <FaceChip face={p.front} /> : <span className="text-muted">sky</span>}
            <span aria-hidden className="text-muted">→</span>
            {p.rear ? <FaceChip face={p.rear} /> : <span className="text-muted">sensor</span>}
          </p>
        </>
      ) : (
        <div className="space-y-2 py-1"><div className="h-3 w-1/3 animate-pulse rounded bg-sunken" /><div className="h-4 w-3/4 animate-pulse rounded bg-sunken" /><span className="sr-only">Loading {slug}…</span></div>
      )}
    </div>
  );
}

/** A face in a few characters: colour, code, ♂ or ♀ (spelled out for screen readers). */
export function FaceChip({ face }: { face: { interface: string; gender: "male" | "female" } }) {
  return (
    <span className="inline-flex items-center gap-1 whitespace-nowrap" title={`${getInterface(face.interface)?.name ?? face.interface}, ${face.gender}`}>
      <span aria-hidden className="inline-block h-2 w-2 rounded-sm night:!bg-brass" style={{ background: `hsl(${interfaceHue(face.interface)} 55% 45%)` }} />
      <span className="code">{interfaceLabel(face.interface)}</span>
      <span aria-hidden className="text-muted">{face.gender === "male" ? "♂" : "♀"}</span>
      <span className="sr-only">{face.gender}</span>
    </span>
  );
}

export function SmallButton({ children, label, onClick, disabled }: { children: ReactNode; label: string; onClick: () => void; disabled?: boolean }) {
  return (
    <button type="button" aria-label={label} title={label} onClick={onClick} disabled={disabled}
      className="inline-flex h-7 min-w-7 items-center justify-center rounded border border-line bg-surface px-1.5 text-xs text-text hover:border-brass disabled:opacity-40 disabled:hover:border-line">
      {children}
    </button>
  );
}
