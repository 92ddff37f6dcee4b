// The demo's flagship plan as a planner link (80 mm refractor, 1.0× flattener, 2-inch wheel,
// cooled camera, 2 mm N-BK7 filter): the planner's own example, shared by the browser tests.
export { EXAMPLE_PLAN_HREF as FLAGSHIP_PLAN } from "@/seed/example-plan";
