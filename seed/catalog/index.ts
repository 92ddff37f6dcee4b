// The demo catalog: an invented scenario of ten invented makers, dimensioned as the trade does.
import type { PartInput } from "@/lib/validation/parts";
import { threadAdapters } from "./adapters";
import { cameras } from "./cameras";
import { devices } from "./devices";
import { filterDrawers, filterWheels } from "./filter-holders";
import { mounts } from "./mounts";
import { optics } from "./optics";
import { extensions, spacers } from "./spacers";

export { DEMO_MAKERS, type DemoMakerName } from "./makers";

/** Every demo part; the seeding script stores them as approved. */
export const demoCatalog: PartInput[] = [
  ...optics, ...cameras, ...filterWheels, ...filterDrawers, ...devices,
  ...spacers, ...extensions, ...threadAdapters, ...mounts,
];

export type DemoCase = {
  title: string;
  /** The tube a corrector sits in: context for the planner, not part of the solve. */
  telescope?: string;
  optics: string;
  camera: string;
  /** Devices that must be in the train, sky to sensor. */
  stations: string[];
  /** One filter of this thickness in the beam (n ≈ 1.5); 0 = no filter. */
  filterThicknessMm: number;
  /** Connecting parts to solve with (e.g. what the imager owns); absent = the whole catalog's connectors. */
  parts?: string[];
  /** Parts that, added to `parts`, turn the case into a solution. */
  remedy?: string[];
  expect: "ok" | "too-long" | "no-connection" | "out-of-reach";
  /** For "ok" cases: connecting parts in the best solution (with the remedy, for the others). */
  fewestParts?: number;
  story: string;
};

/** The demo cases' filters are N-BK7, the usual substrate. */
export const DEMO_FILTER_INDEX = 1.5168;

export const DEMO_CASES = {
  flagship: {
    title: "55 mm flattener, 2-inch filter wheel, 17.5 mm camera",
    telescope: "corvane-optical-meridian-80-ed",
    optics: "corvane-optical-plano-1-0-flattener",
    stations: ["nettlebeck-instruments-carousel-7-2in"],
    camera: "quillfield-imaging-cinder-26m-cooled",
    filterThicknessMm: 2,
    expect: "ok",
    fewestParts: 2,
    story: "Wheel 20 mm + camera 17.5 mm = 37.5 mm; the target is 55 + 2/3 mm (2 mm filter), ±0.5 mm. "
      + "Two M48 spacers close the gap: 15 + 3 mm (55.5 mm) or 16.5 + 2 mm (56.0 mm).",
  },
  twoStations: {
    title: "Astrograph with an off-axis guider and a filter drawer",
    optics: "ashdown-glassworks-pennant-61",
    stations: ["nettlebeck-instruments-sidelook-10-5-oag", "nettlebeck-instruments-slide-2in-drawer"],
    camera: "quillfield-imaging-cinder-26m-cooled",
    filterThicknessMm: 2,
    expect: "ok",
    fewestParts: 2,
    story: "OAG 10.5 + drawer 21 + camera 17.5 = 49 mm; 5 + 2 mm of M48 spacers reach 56 mm, inside 55.67 ± 0.5.",
  },
  tooLong: {
    title: "Short-back-focus reducer with a deep camera and a wheel",
    telescope: "corvane-optical-meridian-72-ed",
    optics: "corvane-optical-brevis-0-72-compact-reducer",
    stations: ["marrick-astro-gear-orbit-7-2in"],
    camera: "quillfield-imaging-cinder-26m-cooled",
    filterThicknessMm: 2,
    expect: "too-long",
    story: "The reducer wants 40 mm (+0.67 for the filter, ±0.3). The female/female wheel (25 mm) needs a "
      + "1.5 mm coupler to the 17.5 mm camera: 44 mm before any spacer, 3 mm too long.",
  },
  noConnection: {
    title: "T-thread flattener, M42×1 screw-mount body, only T-thread spacers owned",
    telescope: "corvane-optical-meridian-60-ed",
    optics: "corvane-optical-plano-t-1-0-flattener",
    stations: [],
    camera: "sorrel-camera-co-birch-42-m42-1-screw-mount",
    filterThicknessMm: 0,
    parts: [
      "tarrant-machining-t-thread-spacer-5-mm", "tarrant-machining-t-thread-spacer-10-mm",
      "tarrant-machining-t-thread-spacer-20-mm", "tarrant-machining-t-thread-male-male-coupler-1-5-mm",
    ],
    remedy: ["wrenfold-adapters-t-ring-m42-1"],
    expect: "no-connection",
    fewestParts: 1,
    story: "M42×1 looks like T-thread (M42×0.75) but the pitches differ: nothing owned joins them. "
      + "The 9.54 mm M42×1 T-ring does, and lands at exactly 55 mm with the body's 45.46 mm.",
  },
  outOfReach: {
    title: "The flagship train with only 10 and 30 mm spacers owned",
    telescope: "corvane-optical-meridian-80-ed",
    optics: "corvane-optical-plano-1-0-flattener",
    stations: ["nettlebeck-instruments-carousel-7-2in"],
    camera: "quillfield-imaging-cinder-26m-cooled",
    filterThicknessMm: 2,
    parts: ["tarrant-machining-m48-spacer-10-mm", "tarrant-machining-m48-spacer-30-mm"],
    remedy: ["tarrant-machining-m48-spacer-7-5-mm", "tarrant-machining-m48-spacer-1-mm"],
    expect: "out-of-reach",
    fewestParts: 3,
    story: "37.5 mm plus 10 is 47.5, plus 20 is 57.5: both miss 55.67 ± 0.5. Adding 7.5 + 1 mm to the 10 gives 56.0.",
  },
  sctPrimeFocus: {
    title: "SCT with a 0.63× reducer and a camera body on the EF bayonet",
    telescope: "harrowgate-pell-ridgeway-8-sct",
    optics: "harrowgate-pell-ridgeway-0-63-sct-reducer",
    stations: [],
    camera: "sorrel-camera-co-larch-22-ef-bayonet",
    filterThicknessMm: 0,
    expect: "ok",
    fewestParts: 2,
    story: "Reducer on the 2\"-24 thread wants 105 mm: prime-focus tube 50 + wide M48 T-ring 11 + body 44 = 105 mm.",
  },
} satisfies Record<string, DemoCase>;
