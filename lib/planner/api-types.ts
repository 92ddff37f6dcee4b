// The JSON that POST /api/v1/solve answers when called with catalog references: the
// solver's SolveResult (SOLVER.md) plus what a page needs to draw and explain it.
import type { Chain, SolveResult } from "@/lib/solver";
import type { MissingJoint } from "./join-plan";
import type { Remedy } from "./what-to-change";

export type PlanItem = {
  /** The id used in the solver's steps (catalog slug; owned copies end in "~owned"). */
  id: string;
  slug: string;
  name: string;
  maker: string;
  model: string;
  kind: string;
  front: { interface: string; gender: "male" | "female" } | null;
  rear: { interface: string; gender: "male" | "female" } | null;
  lengthMm: number;
  adjustMm: number | null;
  clearApertureMm: number | null;
  weightG: number | null;
  /** Price the solver counted: 0 for owned parts, the list price for catalog parts, null when unknown. */
  priceCents: number | null;
  owned: boolean;
  /** Filter wheels and drawers: the filter thickness their spec says they hold. */
  filterThicknessMm?: number;
};

export type PlanContext = {
  /** Every part that can appear in a step (optics, corrector, stations, camera, connectors used by any chain). */
  items: Record<string, PlanItem>;
  opticsId: string;            // the item whose rear joint the back focus is measured from
  telescopeId: string | null;  // when a separate corrector is used, the telescope in front of it
  cameraId: string;
  stationIds: string[];
  focalLengthMm: number | null;   // effective (after the corrector's factor)
  apertureMm: number | null;
  focalRatio: number | null;
  sensorWidthMm: number | null;
  sensorHeightMm: number | null;
  sensorDiagonalMm: number | null;
  pixelSizeUm: number | null;
  imageCircleMm: number | null;
  maxLoadG: number | null;
  /** Derived numbers for the chosen optics and camera (lib/optics). */
  plateScaleArcsecPerPx: number | null;
  fieldOfViewDeg: { width: number; height: number; diagonal: number } | null;
  criticalFocusZoneUm: number | null;
  source: "catalog" | "owned" | "shop";
  /** With source "shop": the shop whose stock and prices (in its currency) the answer used. */
  shop?: { slug: string; name: string; currency: string } | null;
  catalogVersion: number;
};

export type PlanResponse = SolveResult & {
  context: PlanContext;
  /** Telescope → corrector connection (no back focus), when a telescope and a corrector are both chosen. */
  telescopeLink: SolveResult | null;
  /**
   * Set when the telescope cannot join its corrector: the plan is then "no-connection" as a
   * whole, `solutions` is empty and `shortest` is the best train behind the corrector.
   */
  missingJoint?: MissingJoint | null;
  /** When nothing lands in the window: the smallest sets of changes (one, else two) that make it land. */
  remedies?: Remedy[];
  /** When nothing lands in the window: the chain that reaches the nearer of the nearest distances. */
  nearestChain?: Chain | null;
  /** Status of the corrector → camera side alone (equal to `status` unless a joint in front is missing). */
  rearStatus?: SolveResult["status"];
};
