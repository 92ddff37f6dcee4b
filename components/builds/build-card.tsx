import Link from "next/link";
import type { BuildSummary } from "@/lib/builds/to-json";
import { signedMm } from "@/lib/builds/train";
import { formatPrice, formatDay } from "@/lib/format";
import { FitBadge, HiddenBadge, ReferenceBadge, VisibilityBadge } from "./badges";


/** The error in words: a signed zero read like a zero tolerance ("±0.00"). */
export function offTarget(errorMm: number): string {
  if (Math.abs(errorMm) < 0.005) return "on target";
  return `${signedMm(errorMm)} mm from target`;
}

/** One build in a list: what it joins, where the sensor lands, who saved it. */
export function BuildCard({ build, showVisibility = false }: { build: BuildSummary; showVisibility?: boolean }) {
  const inside = build.errorMm === null || build.toleranceMm === null || Math.abs(build.errorMm) <= build.toleranceMm + 1e-6;
  return (
    <li className={`relative flex flex-col gap-3 rounded-lg border bg-surface p-4 ${build.endorsed ? "border-brass/60" : "border-line"}`}>
      {build.endorsed || !build.fits || showVisibility || build.hidden ? (
        <div className="flex flex-wrap items-center gap-1.5">
          {build.endorsed ? <ReferenceBadge /> : null}
          {!build.fits ? <FitBadge fits={false} /> : null}
          {showVisibility ? <VisibilityBadge visibility={build.visibility} /> : null}
          {build.hidden ? <HiddenBadge /> : null}
        </div>
      ) : null}
      <h2 className="text-base font-semibold leading-snug text-ink">
        <Link href={`/b/${build.slug}`} className="underline-offset-4 after:absolute after:inset-0 hover:underline">{build.title}</Link>
      </h2>
      <p className="text-sm text-muted">
        {[build.telescope, build.optics].filter(Boolean).join(" + ")}
        {build.stations.length ? ` → ${build.stations.join(" → ")}` : ""} → {build.camera}
      </p>
      <dl className="mt-auto grid grid-cols-3 gap-2 border-t border-line pt-3 text-sm">
        <div>
          <dt className="text-xs text-muted">Sensor at</dt>
          <dd className={`num font-semibold ${inside ? "text-ok" : "text-bad"}`}>
            <span aria-hidden>{inside ? "✓ " : "✕ "}</span>{build.sensorDistanceMm?.toFixed(2) ?? "—"} mm
          </dd>
          {build.errorMm !== null ? <dd className="num text-xs text-muted">{offTarget(build.errorMm)}</dd> : null}
        </div>
        <div>
          <dt className="text-xs text-muted">Target</dt>
          <dd className="num">{build.targetMm !== null ? <>{build.targetMm.toFixed(2)}{build.toleranceMm !== null ? <span className="text-muted"> ± {build.toleranceMm.toFixed(2)}</span> : null} mm</> : "—"}</dd>
        </div>
        <div>
          <dt className="text-xs text-muted">Parts · price</dt>
          <dd className="num">{build.partCount ?? "—"} · {build.priceCents === null ? "—" : formatPrice(build.priceCents)}</dd>
        </div>
      </dl>
      <p className="text-xs text-muted">{build.owner.name} · {formatDay(build.createdAt)}</p>
    </li>
  );
}
