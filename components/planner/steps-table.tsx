"use client";
// Every step with where it starts, its length (the chosen setting for adjustable parts) and the running total.
import type { PlanResponse } from "@/lib/planner/api-types";
import { KIND_LABELS } from "@/lib/format";
import { interfaceLabel } from "@/lib/interfaces";
import { formatLength, type LengthUnit } from "@/lib/units";
import type { Train, TrainItem } from "./train-model";
import { jointGenders } from "./train-model";

const ROLE: Record<TrainItem["role"], string> = { telescope: "Telescope", optics: "Optics", connector: "Connector", station: "Device", camera: "Camera" };

export function StepsTable({ train, result, unit }: { train: Train; result: PlanResponse; unit: LengthUnit }) {
  const L = (mm: number | null) => (mm === null ? "—" : formatLength(mm, unit));
  const opticsAt = train.items.findIndex((i) => i.role === "optics");
  return (
    <div className="overflow-x-auto rounded-md border border-line">
      <table className="w-full text-left text-[13px] sm:text-sm">
        <caption className="sr-only">Steps of the train from sky to sensor, with lengths in {unit === "in" ? "inches" : "millimetres"}</caption>
        <thead className="bg-sunken text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="hidden px-2 py-2 sm:table-cell sm:px-3 font-medium">#</th>
            <th scope="col" className="px-2 py-2 sm:px-3 font-medium">Part</th>
            <th scope="col" className="hidden px-2 py-2 sm:px-3 font-medium sm:table-cell">Joint on its sky side</th>
            <th scope="col" className="hidden px-2 py-2 sm:px-3 text-right font-medium sm:table-cell">Starts at</th>
            <th scope="col" className="px-2 py-2 sm:px-3 text-right font-medium">Length</th>
            <th scope="col" className="px-2 py-2 sm:px-3 text-right font-medium"><span className="sm:hidden">Total</span><span className="hidden sm:inline">Running total</span></th>
          </tr>
        </thead>
        <tbody className="num">
          {train.items.map((it, i) => {
            const joint = i > 0 ? train.joints[i - 1] : null;
            const before = i < opticsAt;
            const counts = it.startMm !== null && it.role !== "optics";
            const adjust = it.item?.adjustMm ?? null;
            return (
              <tr key={it.key} className={`border-t border-line/70 ${before ? "text-muted" : ""} ${it.role === "optics" ? "bg-glass/5" : ""}`}>
                <td className="hidden px-2 py-2 sm:table-cell sm:px-3 align-top text-muted">{counts ? i - opticsAt : ""}</td>
                <td className="px-2 py-2 sm:px-3 align-top">
                  <span className="font-medium text-ink">{it.name}</span>
                  <span className="block text-xs text-muted">
                    {ROLE[it.role]}{it.item && it.role !== "optics" && it.role !== "telescope" && it.role !== "camera" ? ` · ${KIND_LABELS[it.item.kind] ?? it.item.kind}` : ""}
                    {it.reversed ? " · mounted reversed" : ""}{it.item?.owned ? " · yours" : ""}
                    {it.role === "optics" ? `${it.lengthMm > 0 ? ` · ${L(it.lengthMm)} body` : ""} · ${result.targetMm !== null ? "back focus is" : "distances are"} measured from its rear joint plane` : ""}
                    {before && it.role !== "telescope" ? " · in front of the corrector, not counted" : ""}
                  </span>
                  {joint?.code ? <span className="mt-0.5 block text-xs text-muted sm:hidden">joins by <span className="code">{interfaceLabel(joint.code)}</span> {jointGenders(joint)}</span> : null}
                </td>
                <td className="hidden px-2 py-2 sm:px-3 align-top sm:table-cell">
                  {joint ? joint.code ? <span className="whitespace-nowrap"><span className="code">{interfaceLabel(joint.code)}</span> <span className="text-muted">{jointGenders(joint)}</span></span>
                    : <span className="text-bad">no joint found</span> : <span className="text-muted">—</span>}
                </td>
                <td className="hidden px-2 py-2 sm:px-3 text-right align-top sm:table-cell">{counts ? L(it.startMm) : it.role === "optics" ? L(0) : "—"}</td>
                <td className="whitespace-nowrap px-2 py-2 sm:px-3 text-right align-top">
                  {it.role === "telescope" || it.role === "optics" ? <span className="text-muted">—</span> : L(it.lengthMm)}
                  {adjust ? <span className="block text-xs text-muted">set within {L(it.item!.lengthMm)}–{L(it.item!.lengthMm + adjust)}</span> : null}
                </td>
                <td className="whitespace-nowrap px-2 py-2 sm:px-3 text-right align-top font-medium text-ink">{counts ? L(it.startMm! + it.lengthMm) : ""}</td>
              </tr>
            );
          })}
        </tbody>
        {result.targetMm !== null && train.connected ? (
          <tfoot className="num border-t-2 border-line bg-sunken/60 text-sm">
            <tr>
              <td colSpan={5} className="hidden px-2 py-2 sm:px-3 text-right text-muted sm:table-cell">Target (back focus {L(result.targetMm - result.filterShiftMm)} + filter {L(result.filterShiftMm)})</td>
              <td colSpan={2} className="px-2 py-2 text-right text-muted sm:hidden">Target, filter included</td>
              <td className="px-2 py-2 sm:px-3 text-right font-semibold text-ink">{L(result.targetMm)}</td>
            </tr>
          </tfoot>
        ) : null}
      </table>
    </div>
  );
}
