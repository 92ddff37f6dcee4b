// The plan's status is the status of its weakest link. A plan with a separate corrector is two
// solves: telescope → corrector (any mating chain, no back focus) and corrector → camera (the
// back focus window). It is `ok` only when every link is; a telescope that cannot join its
// corrector makes the whole plan `no-connection`, naming that joint and what would close it.
// Pure: no database, so it is unit-tested directly.
import { getInterface } from "@/lib/interfaces";
import type { Part, Port, SolveResult } from "@/lib/solver";

export type MissingJoint = {
  /** The item on the sky side of the gap (the telescope) and on the sensor side (the corrector). */
  skyId: string;
  sensorId: string;
  sky: Port | null;
  sensor: Port | null;
  /** Catalog parts that would join the gap, best first; empty when the catalog holds none. */
  adapterIds: string[];
  /** The adapter the gap needs, in words ("2-inch barrel (male) front, M63 × 1 (female) rear"). */
  needed: string | null;
  /** The joint and the fix in words (the plan's reason without its lead-in). */
  detail: string;
};

const portText = (p: Port) => `${getInterface(p.interface)?.name ?? p.interface} (${p.gender})`;
const opposite = (p: Port): Port => ({ interface: p.interface, gender: p.gender === "male" ? "female" : "male" });

// "an M63 × 1", "a 2-inch barrel": letters and digits read aloud with a vowel sound take "an".
const article = (text: string) => (/^(?:[AEFHILMNORSX](?:\d|\b|[ -])|[aeiou]|8|11|18)/i.test(text) ? "an" : "a");
const withArticle = (text: string) => `${article(text)} ${text}`;

/** The single adapter a gap between these two faces would need. */
export function neededAdapter(sky: Port | null, sensor: Port | null): string | null {
  if (!sky || !sensor) return null;
  return `an adapter with ${withArticle(portText(opposite(sky)))} front and ${withArticle(portText(opposite(sensor)))} rear`;
}

/** The connecting parts of the best chains in a telescope → corrector solve, without repeats. */
export function adaptersFrom(link: SolveResult | null): string[] {
  const ids: string[] = [];
  for (const chain of link?.solutions ?? []) {
    const key = chain.steps.filter((s) => s.role === "connector").map((s) => s.partId);
    for (const id of key) if (!ids.includes(id)) ids.push(id);
  }
  return ids;
}

export type JoinInput = {
  /** Corrector → camera (the back focus side). */
  rear: SolveResult;
  /** Telescope → corrector with the parts the plan draws from; null without a separate corrector. */
  link: SolveResult | null;
  telescope: Part & { name: string } | null;
  corrector: Part & { name: string } | null;
  /** The same link solved against the whole catalog, when the plan's own parts did not close it. */
  catalogLink?: SolveResult | null;
  /** Names of catalog parts, for the reason. */
  nameOf?: (id: string) => string;
};

export type JoinedPlan = SolveResult & { missingJoint: MissingJoint | null; rearStatus: SolveResult["status"] };

export function joinPlan({ rear, link, telescope, corrector, catalogLink, nameOf = (id) => id }: JoinInput): JoinedPlan {
  if (!link || !telescope || !corrector || link.status === "ok") return { ...rear, missingJoint: null, rearStatus: rear.status };
  const adapterIds = adaptersFrom(catalogLink ?? null);
  const missingJoint: MissingJoint = {
    skyId: telescope.id, sensorId: corrector.id, sky: telescope.rear, sensor: corrector.front,
    adapterIds, needed: neededAdapter(telescope.rear, corrector.front), detail: "",
  };
  const joint = telescope.rear && corrector.front
    ? `the ${telescope.name}'s ${portText(telescope.rear)} rear does not mate with the ${corrector.name}'s ${portText(corrector.front)} front`
    : `the ${telescope.name} has no face the ${corrector.name} can join`;
  const fix = adapterIds.length
    ? `The catalog has what joins them: ${adapterIds.slice(0, 3).map(nameOf).join("; ")}.`
    : `It needs ${missingJoint.needed ?? "an adapter"}: there is none in the catalog.`;
  const sentence = joint[0].toUpperCase() + joint.slice(1);
  missingJoint.detail = `${sentence}. ${fix}`;
  // Behind the corrector the train may well reach focus; it is kept (as `shortest`, so the
  // diagram can draw it) but offered as nothing: no alternatives, nothing to save.
  const behind = rear.solutions[0] ?? rear.shortest;
  return {
    ...rear,
    status: "no-connection",
    solutions: [],
    shortest: behind,
    nearest: undefined,
    reason: `The telescope does not join the corrector: ${joint}. ${fix}`,
    missingJoint,
    rearStatus: rear.status,
  };
}
