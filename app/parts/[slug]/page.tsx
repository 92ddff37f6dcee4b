import Link from "next/link";
import { notFound } from "next/navigation";
import { getPartOrThrow } from "@/db/queries/parts";
import { CorrectPartForm } from "@/components/parts/correct-part-form";
import { OwnButton } from "@/components/parts/own-button";
import { PartProfile } from "@/components/parts/part-profile";
import { getOwnedQuantity } from "@/db/queries/gear";
import { InterfaceChip } from "@/components/parts/interface-chip";
import { SafetyNote } from "@/components/safety-note";
import { PartStockists } from "@/components/shops/part-stockists";
import { ButtonLink } from "@/components/ui/button";
import { allowed, getSessionUser } from "@/lib/auth/session";
import { rowToApiPart } from "@/lib/catalog/part-json";
import { AppError } from "@/lib/errors";
import { KIND_LABELS, formatGrams, formatPrice } from "@/lib/format";
import { formatMm } from "@/lib/units";
import { getInterface } from "@/lib/interfaces";


function planHref(kind: string, slug: string) {
  if (kind === "optics") return `/plan?optics=${slug}`;
  if (kind === "camera") return `/plan?camera=${slug}`;
  if (["filter-wheel", "filter-drawer", "oag", "tilt-plate"].includes(kind)) return `/plan?stations=${slug}`;
  return `/plan`;
}

export async function generateMetadata({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  return { title: slug.replace(/-/g, " ") };
}

export default async function PartPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const user = await getSessionUser();
  let row;
  try {
    row = await getPartOrThrow({ ref: slug, viewer: user ? { id: user.id, moderator: allowed(user, { part: "review" }) } : null });
  } catch (err) {
    if (err instanceof AppError && err.status === 404) notFound();
    throw err;
  }
  const p = rowToApiPart(row);
  const owned = user ? await getOwnedQuantity({ userId: user.id, partId: row.id }) : 0;
  const s = row.specs;
  const numbers: [string, string][] = [
    ["Optical length", `${formatMm(p.lengthMm)}${p.adjustMm ? ` to ${formatMm(p.lengthMm + p.adjustMm)} (adjustable)` : ""}`],
    ...(p.clearApertureMm ? [["Clear aperture", formatMm(p.clearApertureMm)] as [string, string]] : []),
    ...(p.weightG ? [["Weight", formatGrams(p.weightG)] as [string, string]] : []),
    ...(p.reversible ? [["Mounting", "Either way round"] as [string, string]] : []),
    ...(s.focalLengthMm ? [["Focal length", formatMm(s.focalLengthMm, 0)] as [string, string]] : []),
    ...(s.apertureMm ? [["Aperture", formatMm(s.apertureMm, 0)] as [string, string]] : []),
    ...(p.focalRatio ? [["Focal ratio", `f/${p.focalRatio.toFixed(1)}`] as [string, string]] : []),
    ...(s.backFocusMm !== undefined ? [["Back focus", `${formatMm(s.backFocusMm)} ± ${(s.backFocusToleranceMm ?? 0.5).toFixed(1)} mm`] as [string, string]] : []),
    ...(s.reduction ? [["Focal length factor", `×${s.reduction.toFixed(2)}`] as [string, string]] : []),
    ...(s.imageCircleMm ? [["Corrected image circle", formatMm(s.imageCircleMm, 0)] as [string, string]] : []),
    ...(s.maxLoadG ? [["Focuser load limit", formatGrams(s.maxLoadG)] as [string, string]] : []),
    ...(s.sensorWidthMm ? [["Sensor", `${s.sensorWidthMm} × ${s.sensorHeightMm} mm (diagonal ${formatMm(p.sensorDiagonalMm)})`] as [string, string]] : []),
    ...(s.pixelSizeUm ? [["Pixel size", `${s.pixelSizeUm} µm`] as [string, string]] : []),
    ...(s.flangeDepthMm ? [["Flange to sensor", formatMm(s.flangeDepthMm, 2)] as [string, string]] : []),
    ...(s.windowThicknessMm ? [["Sensor window", formatMm(s.windowThicknessMm)] as [string, string]] : []),
    ...(s.filterSize ? [["Filters", `${s.slots ?? 1} × ${s.filterSize}${s.filterThicknessMm ? `, up to ${s.filterThicknessMm} mm thick` : ""}`] as [string, string]] : []),
    ...(p.listPriceCents ? [["List price", formatPrice(p.listPriceCents)] as [string, string]] : []),
  ];
  return (
    <article className="max-w-5xl space-y-6">
      <nav className="text-sm text-muted"><Link href="/parts" className="underline-offset-4 hover:underline">Parts</Link> / {KIND_LABELS[p.kind]}</nav>
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm text-muted">{p.maker}</p>
          <h1 className="text-3xl font-semibold tracking-tight text-ink">{p.model}</h1>
          <p className="mt-1 text-muted">{KIND_LABELS[p.kind]}{s.opticsRole ? ` · ${s.opticsRole}` : ""}{row.status !== "approved" ? ` · ${row.status}` : ""}</p>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          {user && row.status === "approved" ? <OwnButton partId={row.id} initialQuantity={owned} /> : null}
          <ButtonLink href={planHref(p.kind, p.slug)}>Plan with this</ButtonLink>
        </div>
      </header>
      {p.description ? <p className="max-w-3xl text-text">{p.description}</p> : null}
      <section aria-label="Faces" className="grid items-center gap-6 rounded-lg border border-line bg-surface p-5 md:grid-cols-[1.4fr_1fr]">
        <PartProfile front={p.front} rear={p.rear} lengthMm={p.lengthMm} name={p.name} />
        <div className="space-y-3 text-sm">
          {(["front", "rear"] as const).map((side) => {
            const port = p[side];
            return (
              <div key={side}>
                <div className="text-xs uppercase tracking-wide text-muted">{side === "front" ? "Sky side (front)" : "Sensor side (rear)"}</div>
                {port ? <InterfaceChip code={port.interface} gender={port.gender} /> : <span className="text-muted">{side === "front" ? "Open to the sky" : "Ends at the sensor"}</span>}
                {port ? <p className="text-xs text-muted">Mates with a {port.gender === "male" ? "female" : "male"} {getInterface(port.interface)?.name ?? port.interface}{getInterface(port.interface)?.note ? `. ${getInterface(port.interface)!.note}` : ""}</p> : null}
              </div>
            );
          })}
        </div>
      </section>
      <section aria-label="Numbers" className="rounded-lg border border-line bg-surface">
        <dl className="grid sm:grid-cols-2">
          {numbers.map(([k, v]) => (
            <div key={k} className="flex justify-between gap-4 border-b border-line/70 px-5 py-2.5 text-sm">
              <dt className="text-muted">{k}</dt><dd className="num text-right text-text">{v}</dd>
            </div>
          ))}
        </dl>
      </section>
      {row.status === "approved" ? <PartStockists partId={row.id} /> : null}
      {allowed(user, { part: "review" }) ? <CorrectPartForm slug={p.slug} initial={{ lengthMm: p.lengthMm, adjustMm: p.adjustMm, clearApertureMm: p.clearApertureMm, weightG: p.weightG, listPriceCents: p.listPriceCents }} /> : null}
      {p.kind === "optics" ? <SafetyNote /> : null}
    </article>
  );
}
