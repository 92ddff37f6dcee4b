// The demo's flagship plan as a planner link (80 mm refractor, 1.0× flattener, 2-inch wheel,
// cooled camera, 2 mm N-BK7 filter), shared by the browser tests that open it.
import { DEMO_CASES } from "@/seed/catalog";

const f = DEMO_CASES.flagship;
export const FLAGSHIP_PLAN = `/plan?optics=${f.telescope}&corrector=${f.optics}&camera=${f.camera}&stations=${f.stations.join(",")}&filter=${f.filterThicknessMm}&n=1.5168`;
