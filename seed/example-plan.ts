// The example plan the planner offers on its empty page: the demo's flagship case (80 mm
// refractor, 1.0× flattener, 2-inch wheel, cooled camera) with a 2 mm N-BK7 filter. One
// constant shared by the seed's cases, the planner page and the browser tests.
import { EMPTY_PLAN, planStateToParams, type PlanState } from "@/lib/planner/url-state";
import { DEMO_CASES, DEMO_FILTER_INDEX } from "./catalog";

const flagship = DEMO_CASES.flagship;

export const EXAMPLE_PLAN: PlanState = {
  ...EMPTY_PLAN,
  optics: flagship.telescope,
  corrector: flagship.optics,
  camera: flagship.camera,
  stations: [...flagship.stations],
  filter: { thicknessMm: flagship.filterThicknessMm, refractiveIndex: DEMO_FILTER_INDEX },
};

export const EXAMPLE_PLAN_HREF = `/plan?${planStateToParams(EXAMPLE_PLAN)}`;
