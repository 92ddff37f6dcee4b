// The planner's URL codec: a link reproduces a plan, and bad values are dropped safely.
import { describe, expect, it } from "vitest";
import {
  EMPTY_PLAN, MAX_STATIONS, parsePlanParams, planStateToParams, planStateToSolveRequest, sameQuestion, type PlanState,
} from "@/lib/planner/url-state";

const parse = (query: string) => parsePlanParams(new URLSearchParams(query));

const full: PlanState = {
  optics: "corvane-optical-meridian-80-ed",
  corrector: "corvane-optical-plano-1-0-flattener",
  camera: "quillfield-imaging-cinder-26m-cooled",
  stations: ["nettlebeck-instruments-sidelook-10-5-oag", "nettlebeck-instruments-carousel-7-2in"],
  filter: { thicknessMm: 2, refractiveIndex: 1.5168 },
  extraGlass: { thicknessMm: 1, refractiveIndex: 1.458 },
  toleranceMm: 0.3,
  source: "owned",
  shop: null,
  shopOwned: false,
  unit: "in",
  alt: 1,
};

describe("planner URL: a shop's stock as the source", () => {
  it("round-trips source=shop with the shop and the owned-first switch", () => {
    const state = parse("optics=a&camera=b&source=shop&shop=lantern-row-optics&own=1");
    expect(state).toMatchObject({ source: "shop", shop: "lantern-row-optics", shopOwned: true });
    expect(parse(planStateToParams(state).toString())).toEqual(state);
    expect(planStateToSolveRequest(state)?.source).toEqual({ kind: "shop", shop: "lantern-row-optics", owned: true });
  });

  it("falls back to the catalog when the shop is missing or not a slug", () => {
    expect(parse("source=shop").source).toBe("catalog");
    expect(parse("source=shop&shop=Not%20A%20Slug!").source).toBe("catalog");
  });
});

describe("planner URL: round trips", () => {
  it("an empty state is an empty query, and back", () => {
    expect(planStateToParams(EMPTY_PLAN).toString()).toBe("");
    expect(parse("")).toEqual(EMPTY_PLAN);
  });

  it("every choice survives state → URL → state", () => {
    const params = planStateToParams(full);
    expect(parsePlanParams(new URLSearchParams(params.toString()))).toEqual(full);
  });

  it("writes the documented parameter names", () => {
    const q = Object.fromEntries(planStateToParams(full));
    expect(q).toEqual({
      optics: full.optics, corrector: full.corrector, camera: full.camera,
      stations: "nettlebeck-instruments-sidelook-10-5-oag,nettlebeck-instruments-carousel-7-2in",
      filter: "2", n: "1.5168", glass: "1", gn: "1.458", tol: "0.3", source: "owned", unit: "in", alt: "2",
    });
  });

  it("the URL's alt counts from 1; the state's from 0", () => {
    expect(parse("alt=3").alt).toBe(2);
    expect(planStateToParams({ ...EMPTY_PLAN, alt: 0 }).has("alt")).toBe(false);
  });

  it("URL → state → URL gives back the same query for a canonical link", () => {
    const query = "optics=a-b&camera=c&stations=d,e,d&filter=3&n=1.458&tol=0.25&unit=in&alt=4";
    expect(planStateToParams(parse(query)).toString()).toBe(new URLSearchParams(query).toString());
  });

  it("keeps no float noise in numbers", () => {
    const p = planStateToParams({ ...EMPTY_PLAN, toleranceMm: 0.1 + 0.2, filter: { thicknessMm: 2, refractiveIndex: 1.5 } });
    expect(p.get("tol")).toBe("0.3");
    expect(p.get("n")).toBe("1.5");
  });
});

describe("planner URL: bad values are ignored", () => {
  it("drops slugs that are not slugs", () => {
    const s = parse("optics=../../etc&camera=%3Cscript%3E&stations=ok-one,BAD SLUG,,-x,two");
    expect(s.optics).toBeNull();
    expect(s.camera).toBeNull();
    expect(s.stations).toEqual(["ok-one", "two"]);
  });

  it("lower-cases and trims slugs", () => {
    expect(parse("camera=%20Quill-Cam%20").camera).toBe("quill-cam");
  });

  it("drops a corrector without optics", () => {
    expect(parse("corrector=plano").corrector).toBeNull();
    expect(planStateToParams({ ...EMPTY_PLAN, corrector: "plano" }).has("corrector")).toBe(false);
  });

  it("caps the number of stations", () => {
    const many = Array.from({ length: 20 }, (_, i) => `s${i}`).join(",");
    expect(parse(`stations=${many}`).stations).toHaveLength(MAX_STATIONS);
  });

  it("drops filters that are zero, negative, absurd or not numbers", () => {
    for (const v of ["0", "-2", "abc", "", "1e9", "Infinity", "NaN", "11"]) expect(parse(`filter=${v}`).filter).toBeNull();
  });

  it("falls back to n = 1.5 for a missing or impossible index", () => {
    expect(parse("filter=2").filter).toEqual({ thicknessMm: 2, refractiveIndex: 1.5 });
    expect(parse("filter=2&n=0.7").filter).toEqual({ thicknessMm: 2, refractiveIndex: 1.5 });
    expect(parse("filter=2&n=x").filter).toEqual({ thicknessMm: 2, refractiveIndex: 1.5 });
    expect(parse("n=1.6").filter).toBeNull();
  });

  it("drops tolerances outside 0.01–10 mm", () => {
    for (const v of ["0", "-0.3", "0.001", "12", "wide"]) expect(parse(`tol=${v}`).toleranceMm).toBeNull();
    expect(parse("tol=0.75").toleranceMm).toBe(0.75);
  });

  it("knows only its own source, unit and alt values", () => {
    const s = parse("source=shop&unit=furlong&alt=0");
    expect([s.source, s.unit, s.alt]).toEqual(["catalog", "mm", 0]);
    expect(parse("alt=2.5").alt).toBe(0);
    expect(parse("alt=99").alt).toBe(0);
  });

  it("ignores unknown parameters", () => {
    expect(parse("utm_source=forum&foo=bar")).toEqual(EMPTY_PLAN);
  });
});

describe("planner URL: the solve request", () => {
  it("is null until optics and camera are chosen", () => {
    expect(planStateToSolveRequest(EMPTY_PLAN)).toBeNull();
    expect(planStateToSolveRequest({ ...EMPTY_PLAN, optics: "a" })).toBeNull();
    expect(planStateToSolveRequest({ ...EMPTY_PLAN, camera: "b" })).toBeNull();
  });

  it("carries every choice in the API's shape", () => {
    expect(planStateToSolveRequest(full)).toEqual({
      optics: { partId: full.optics }, corrector: { partId: full.corrector }, camera: { partId: full.camera },
      stations: full.stations.map((partId) => ({ partId })),
      filters: [{ thicknessMm: 2, refractiveIndex: 1.5168 }, { thicknessMm: 1, refractiveIndex: 1.458 }],
      backFocusToleranceMm: 0.3, source: { kind: "owned" }, maxSolutions: 8,
    });
  });

  it("leaves out what is not chosen", () => {
    const r = planStateToSolveRequest({ ...EMPTY_PLAN, optics: "a", camera: "b" })!;
    expect(r).toEqual({ optics: { partId: "a" }, camera: { partId: "b" }, stations: [], filters: [], source: { kind: "catalog" }, maxSolutions: 8 });
  });

  it("unit and alternative do not change the question", () => {
    expect(sameQuestion(full, { ...full, unit: "mm", alt: 0 })).toBe(true);
    expect(sameQuestion(full, { ...full, toleranceMm: 0.5 })).toBe(false);
  });
});
