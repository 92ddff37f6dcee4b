// A saved build as a drawable train: items sky to sensor and the joints between them. Pure.
import type { PlanResponse } from "@/lib/planner/api-types";
import type { Chain, Gender } from "@/lib/solver/types";
import { chosenTelescopeLink, itemOf } from "./chain";

type Port = { interface: string; gender: Gender } | null;

export type TrainRole = "telescope" | "optics" | "connector" | "station" | "camera";
export type TrainItem = {
  key: string; id: string; name: string; kind: string; role: TrainRole; owned: boolean;
  /** As set; 0 for the optics (the budget starts at their rear joint plane). */
  lengthMm: number;
  /** From the optics' rear joint plane; null in front of it. */
  startMm: number | null;
  front: Port; rear: Port; reversed: boolean;
};
export type TrainJoint = { code: string; skyGender: Gender | null; sensorGender: Gender | null };
export type BuildTrain = { items: TrainItem[]; joints: TrainJoint[] };

export function buildTrainOf(result: PlanResponse, chain: Chain): BuildTrain {
  const ctx = result.context;
  const items: TrainItem[] = [];
  const codes: string[] = [];
  const fixed = (id: string, role: TrainRole): TrainItem => {
    const it = itemOf(result, id);
    return { key: role, id, name: it.name, kind: it.kind, role, owned: it.owned, lengthMm: 0, startMm: role === "optics" ? 0 : null, front: it.front, rear: it.rear, reversed: false };
  };
  const step = (s: Chain["steps"][number], key: string, inLink: boolean): TrainItem => {
    const it = itemOf(result, s.partId);
    return {
      key, id: s.partId, name: it.name, kind: it.kind, role: s.role, owned: it.owned, lengthMm: s.lengthMm,
      startMm: inLink ? null : s.startMm, reversed: s.reversed,
      front: s.reversed ? it.rear : it.front, rear: s.reversed ? it.front : it.rear,
    };
  };
  if (ctx.telescopeId) {
    items.push(fixed(ctx.telescopeId, "telescope"));
    chosenTelescopeLink(result)?.steps.forEach((s, i) => {
      codes.push(s.joint.interface);
      if (s.role !== "camera") items.push(step(s, `link-${i}`, true));
    });
  }
  items.push(fixed(ctx.opticsId, "optics"));
  chain.steps.forEach((s, i) => {
    codes.push(s.joint.interface);
    items.push(step(s, `step-${i}`, false));
  });
  // With a telescope but no link found, the first code is missing: align joints from the end.
  const joints: TrainJoint[] = [];
  for (let i = 0; i < items.length - 1; i++) {
    const code = codes[codes.length - (items.length - 1) + i] ?? items[i].rear?.interface ?? "?";
    joints.push({
      code,
      skyGender: items[i].rear?.interface === code ? items[i].rear!.gender : null,
      sensorGender: items[i + 1].front?.interface === code ? items[i + 1].front!.gender : null,
    });
  }
  return { items, joints };
}

export const genderSign = (g: Gender | null) => (g === "male" ? "♂" : g === "female" ? "♀" : "?");

export function signedMm(mm: number, digits = 2): string {
  const t = mm.toFixed(digits);
  if (Number(t) === 0) return `±${(0).toFixed(digits)}`;
  return mm > 0 ? `+${t}` : `−${t.slice(1)}`;
}

/** Inside the window (or no window at all). */
export function landsInside(chain: Chain, toleranceMm: number | null): boolean {
  return chain.errorMm === null || toleranceMm === null || Math.abs(chain.errorMm) <= toleranceMm + 1e-6;
}
