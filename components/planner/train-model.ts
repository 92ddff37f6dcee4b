// Pure helpers that turn an answer of POST /api/v1/solve into what the planner draws.
import type { Chain, Gender, Step } from "@/lib/solver";
import type { PlanItem, PlanResponse } from "@/lib/planner/api-types";

type Port = { interface: string; gender: Gender } | null;

export type TrainRole = "telescope" | "optics" | "connector" | "station" | "camera";

export type TrainItem = {
  key: string;
  itemId: string;
  item: PlanItem | undefined;
  name: string;
  role: TrainRole;
  /** As set (adjustable parts: the chosen setting). */
  lengthMm: number;
  /** From the optics' rear joint plane; null in front of it (telescope → corrector). */
  startMm: number | null;
  reversed: boolean;
  front: Port;
  rear: Port;
};

export type TrainJoint = {
  /** Interface code; null where no joint could be found. */
  code: string | null;
  skyGender: Gender | null;
  sensorGender: Gender | null;
};

export type Train = { items: TrainItem[]; joints: TrainJoint[]; connected: boolean };

export function itemName(result: Pick<PlanResponse, "context">, id: string): string {
  const it = result.context.items[id];
  return it?.name ?? id.replace(/~owned$/, "");
}

function fromItem(result: PlanResponse, id: string, role: TrainRole, key: string): TrainItem {
  const item = result.context.items[id];
  return {
    key, itemId: id, item, name: itemName(result, id), role,
    lengthMm: role === "telescope" ? 0 : item?.lengthMm ?? 0, startMm: role === "optics" ? 0 : null, reversed: false,
    front: item?.front ?? null, rear: item?.rear ?? null,
  };
}

function fromStep(result: PlanResponse, step: Step, key: string, inLink: boolean): TrainItem {
  const item = result.context.items[step.partId];
  const front = item?.front ?? null, rear = item?.rear ?? null;
  return {
    key, itemId: step.partId, item, name: itemName(result, step.partId), role: step.role,
    lengthMm: step.lengthMm, startMm: inLink ? null : step.startMm, reversed: step.reversed,
    front: step.reversed ? rear : front, rear: step.reversed ? front : rear,
  };
}

function joint(a: TrainItem, b: TrainItem, code: string | null): TrainJoint {
  if (code === null) return { code: null, skyGender: null, sensorGender: null };
  return {
    code,
    skyGender: a.rear?.interface === code ? a.rear.gender : null,
    sensorGender: b.front?.interface === code ? b.front.gender : null,
  };
}

/**
 * Sky to sensor: [telescope → its connectors →] optics → connectors and stations → camera.
 * Without a chain, the fixed items (optics, stations, camera) with open gaps between them.
 */
export function buildTrain(result: PlanResponse, chain: Chain | null): Train {
  const ctx = result.context;
  const items: TrainItem[] = [];
  const codes: (string | null)[] = [];
  let connected = true;

  if (ctx.telescopeId) {
    items.push(fromItem(result, ctx.telescopeId, "telescope", "telescope"));
    const link = result.telescopeLink?.solutions[0] ?? result.telescopeLink?.shortest ?? null;
    if (link) {
      link.steps.forEach((s, i) => {
        codes.push(s.joint.interface);
        if (s.role !== "camera") items.push(fromStep(result, s, `link-${i}`, true));
      });
    } else {
      codes.push(null);
      connected = false;
    }
  }
  items.push(fromItem(result, ctx.opticsId, "optics", "optics"));

  if (chain) {
    chain.steps.forEach((s, i) => {
      codes.push(s.joint.interface);
      items.push(fromStep(result, s, `step-${i}`, false));
    });
  } else {
    connected = false;
    for (const id of [...ctx.stationIds, ctx.cameraId]) {
      codes.push(null);
      items.push(fromItem(result, id, id === ctx.cameraId ? "camera" : "station", `fixed-${items.length}`));
    }
  }
  const joints = codes.map((c, i) => joint(items[i], items[i + 1], c));
  return { items, joints, connected };
}

/** The chain to show: the chosen solution, else the nearest reachable chain, else the shortest connection. */
export function shownChain(result: PlanResponse, alt: number): { chain: Chain | null; index: number; isSolution: boolean } {
  if (result.solutions.length) {
    const index = Math.min(Math.max(0, alt), result.solutions.length - 1);
    return { chain: result.solutions[index], index, isSolution: true };
  }
  return { chain: result.nearestChain ?? result.shortest, index: 0, isSolution: false };
}

export function genderSign(g: Gender | null): string {
  return g === "male" ? "♂" : g === "female" ? "♀" : "?";
}

/** "♂→♀": which side of the joint is male, sky side first. */
export function jointGenders(j: TrainJoint): string {
  return `${genderSign(j.skyGender)}→${genderSign(j.sensorGender)}`;
}

export function signed(mm: number, digits = 2): string {
  const t = mm.toFixed(digits);
  if (Number(t) === 0) return `±${(0).toFixed(digits)}`;
  return mm > 0 ? `+${t}` : `−${t.slice(1)}`;
}

export function isInside(chain: Chain | null, tol: number | null): boolean {
  if (!chain) return false;
  if (chain.errorMm === null || tol === null) return true;
  return Math.abs(chain.errorMm) <= tol + 1e-6;
}
