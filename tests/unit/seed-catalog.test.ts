// Seed sanity: the demo catalog parses, uses only registered interfaces, follows the trade's
// published dimensions, and its demo cases behave as they claim.
import { CONNECTOR_KINDS as PLANNER_CONNECTOR_KINDS } from "@/lib/catalog/to-solver";
import { describe, expect, it } from "vitest";
import { getInterface, INTERFACE_CODES, INTERFACES } from "@/lib/interfaces";
import { partInputSchema, type PartInput } from "@/lib/validation/parts";
import { DEMO_CASES, DEMO_MAKERS, demoCatalog, type DemoCase } from "@/seed/catalog";
import { EXAMPLE_PLAN, EXAMPLE_PLAN_HREF } from "@/seed/example-plan";
import { parsePlanParams } from "@/lib/planner/url-state";

const bySlug = new Map(demoCatalog.map((p) => [p.slug!, p]));
const get = (slug: string): PartInput => bySlug.get(slug) ?? expect.unreachable(`No demo part ${slug}`);
const ports = (p: PartInput) => [p.front, p.rear].filter((x): x is NonNullable<typeof x> => x !== null);
const role = (p: PartInput) => p.specs?.opticsRole;

describe("demo catalog: shape", () => {
  it("every part satisfies partInputSchema", () => {
    const failures = demoCatalog.flatMap((p) => {
      const r = partInputSchema.safeParse(p);
      return r.success ? [] : [`${p.slug}: ${r.error.issues.map((i) => `${i.path.join(".")} ${i.message}`).join("; ")}`];
    });
    expect(failures).toEqual([]);
  });

  it("has at least 200 parts with unique slugs", () => {
    expect(demoCatalog.length).toBeGreaterThanOrEqual(200);
    expect(demoCatalog.every((p) => typeof p.slug === "string")).toBe(true);
    expect(new Set(demoCatalog.map((p) => p.slug)).size).toBe(demoCatalog.length);
  });

  it("comes from at least six invented makers, all listed in DEMO_MAKERS", () => {
    const used = new Set(demoCatalog.map((p) => p.maker));
    expect(used.size).toBeGreaterThanOrEqual(6);
    const listed = new Set<string>(DEMO_MAKERS.map((m) => m.name));
    expect([...used].filter((m) => !listed.has(m))).toEqual([]);
  });

  it("names no real maker (a guard list of well-known brands in this trade)", () => {
    const brands = /\b(celestron|sky-?watcher|zwo|qhy|baader|takahashi|william optics|askar|sharpstar|player one|moravian|atik|starlight xpress|sbig|optolong|astronomik|antlia|explore scientific|meade|orion|vixen|tele ?vue|stellarvue|canon|nikon|sony|fuji(film)?|olympus|panasonic|pentax|leica|zeiss|teleskop|pegasus|primaluce|starizona|optec|astro-physics|lacerta|omegon|bresser|svbony|altair|touptek|geoptik|borg|rowan)\b/i;
    const hits = demoCatalog.filter((p) => brands.test(`${p.maker} ${p.model} ${p.description ?? ""}`)).map((p) => p.slug);
    expect(hits).toEqual([]);
  });

  it("covers the kinds the issue asks for, and every optics role", () => {
    const kinds = new Set(demoCatalog.map((p) => p.kind));
    const required = ["optics", "camera", "adapter", "spacer", "extension", "filter-wheel", "filter-drawer", "oag"];
    for (const k of required) expect(kinds, k).toContain(k);
    const roles = new Set(demoCatalog.map(role));
    for (const r of ["telescope", "corrector", "astrograph"]) expect(roles, r).toContain(r);
  });
});

describe("demo catalog: interfaces", () => {
  it("every port uses a registered interface", () => {
    const bad = demoCatalog.flatMap((p) => ports(p).filter((x) => !INTERFACE_CODES.includes(x.interface)).map(() => p.slug));
    expect(bad).toEqual([]);
  });

  it("uses at least nine interfaces", () => {
    expect(new Set(demoCatalog.flatMap((p) => ports(p).map((x) => x.interface))).size).toBeGreaterThanOrEqual(9);
  });

  it("has an adapter between every pair of registered threads", () => {
    const threads = INTERFACES.filter((i) => i.kind === "thread").map((i) => i.code);
    const joined = new Set(demoCatalog.filter((p) => p.front && p.rear)
      .map((p) => [p.front!.interface, p.rear!.interface].sort().join("|")));
    const pairs = threads.flatMap((a, i) => threads.slice(i + 1).map((b) => [a, b].sort().join("|")));
    expect(pairs.length).toBeGreaterThanOrEqual(45);
    expect(pairs.filter((k) => !joined.has(k))).toEqual([]);
  });
});

describe("demo catalog: published dimensions", () => {
  // Source: Wikipedia, "T-mount" (T-mount flange focal distance 55 mm; adapter length =
  // 55 − body's flange focal distance); Wikipedia, "Flange focal distance" (bayonets, from
  // memory of that list); Wikipedia, "M42 lens mount" (45.46 mm); "Micro Four Thirds system" (19.25 mm).
  const T_MOUNT_MM = 55;
  const PUBLISHED_FLANGE_MM: Record<string, number> = {
    "bayonet-ef": 44.0, "bayonet-f": 46.5, "bayonet-e": 18.0, "bayonet-rf": 20.0, "bayonet-z": 16.0,
    "bayonet-x": 17.7, "bayonet-mft": 19.25, "M42x1": 45.46,
  };
  const isTRing = (p: PartInput) => p.front?.gender === "female" && p.rear?.gender === "male"
    && (getInterface(p.rear.interface)?.kind === "bayonet"
      || (p.front.interface === "M42x0.75" && p.rear.interface === "M42x1"));
  const tRings = demoCatalog.filter(isTRing);

  it("T-ring lengths are 55 mm minus the body's published flange focal distance", () => {
    expect(tRings.length).toBeGreaterThanOrEqual(Object.keys(PUBLISHED_FLANGE_MM).length);
    for (const ring of tRings) {
      const published = PUBLISHED_FLANGE_MM[ring.rear!.interface];
      expect(published, ring.slug).toBeDefined();
      expect(ring.lengthMm, ring.slug).toBeCloseTo(T_MOUNT_MM - published, 6);
    }
    // Worked values: EF 55 − 44 = 11 mm; F 55 − 46.5 = 8.5 mm; M42×1 55 − 45.46 = 9.54 mm.
    expect(get("wrenfold-adapters-t-ring-ef").lengthMm).toBeCloseTo(11, 6);
    expect(get("wrenfold-adapters-t-ring-f").lengthMm).toBeCloseTo(8.5, 6);
    expect(get("wrenfold-adapters-t-ring-m42-1").lengthMm).toBeCloseTo(9.54, 6);
  });

  it("has a T-thread T-ring for every published mount", () => {
    const covered = new Set(tRings.filter((r) => r.front!.interface === "M42x0.75").map((r) => r.rear!.interface));
    expect([...covered].sort()).toEqual(Object.keys(PUBLISHED_FLANGE_MM).sort());
  });

  it("bodies on a bayonet or screw mount sit at its published flange focal distance", () => {
    const bodies = demoCatalog.filter((p) => p.kind === "camera" && PUBLISHED_FLANGE_MM[p.front!.interface] !== undefined);
    expect(bodies.length).toBeGreaterThanOrEqual(7);
    for (const b of bodies) expect(b.lengthMm, b.slug).toBeCloseTo(PUBLISHED_FLANGE_MM[b.front!.interface], 6);
  });

  // Source: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959; NIST
  // Handbook 44, App. C); eyepiece barrels 1.25 in = 31.75 mm, 2 in = 50.8 mm (Hoffman).
  const INCH_MM = 25.4;
  const BARREL_MM: Record<string, number> = { "barrel-1.25in": 31.75, "barrel-2in": 50.8 };

  it("barrel ports are 1.25 or 2 inches at 25.4 mm per inch", () => {
    const barrelParts = demoCatalog.filter((p) => ports(p).some((x) => getInterface(x.interface)?.kind === "barrel"));
    expect(barrelParts.length).toBeGreaterThanOrEqual(10);
    for (const p of barrelParts) {
      for (const x of ports(p).filter((q) => getInterface(q.interface)?.kind === "barrel")) {
        const nominal = BARREL_MM[x.interface];
        expect(nominal, `${p.slug} ${x.interface}`).toBeDefined();
        const inches = Number.parseFloat(x.interface.replace("barrel-", ""));
        expect(nominal).toBeCloseTo(inches * INCH_MM, 9);
        expect(getInterface(x.interface)!.diameterMm).toBeCloseTo(nominal, 9);
      }
    }
  });

  it("a male barrel's clear aperture fits inside the barrel", () => {
    for (const p of demoCatalog) {
      const barrel = ports(p).find((x) => x.gender === "male" && BARREL_MM[x.interface] !== undefined);
      if (!barrel || p.clearApertureMm === undefined) continue;
      expect(p.clearApertureMm, p.slug).toBeLessThan(BARREL_MM[barrel.interface] - 2);
    }
  });
});

describe("demo catalog: the trade's conventions (common practice)", () => {
  const USUAL_SPACERS_MM = [0.5, 1, 2, 3, 5, 7.5, 10, 15, 16.5, 20, 30, 40];

  it("M42 and M48 spacer kits run from 0.5 to 40 mm, female front and male rear", () => {
    const spacers = demoCatalog.filter((p) => p.kind === "spacer");
    for (const s of spacers) {
      expect(s.front!.interface, s.slug).toBe(s.rear!.interface);
      expect([s.front!.gender, s.rear!.gender], s.slug).toEqual(["female", "male"]);
    }
    for (const thread of ["M42x0.75", "M48x0.75"]) {
      const kits = new Map<string, Set<number>>();
      for (const s of spacers.filter((x) => x.front!.interface === thread)) {
        kits.set(s.maker, (kits.get(s.maker) ?? new Set()).add(s.lengthMm));
      }
      const full = [...kits.values()].some((k) => USUAL_SPACERS_MM.every((l) => k.has(l)));
      expect(full, thread).toBe(true);
    }
  });

  it("every corrector and astrograph has a male rear and a back focus", () => {
    const corrected = demoCatalog.filter((p) => role(p) === "corrector" || role(p) === "astrograph");
    expect(corrected.length).toBeGreaterThanOrEqual(10);
    for (const c of corrected) {
      expect(c.rear?.gender, c.slug).toBe("male");
      expect(c.specs?.backFocusMm, c.slug).toBeGreaterThan(0);
    }
    // The issue's families: 55 mm correctors on male M48, other back focus values, SCT reducers near 105 mm on 2"-24.
    const correctors = corrected.filter((c) => role(c) === "corrector");
    expect(correctors.some((c) => c.rear!.interface === "M48x0.75" && c.specs!.backFocusMm === 55)).toBe(true);
    expect(correctors.some((c) => c.specs!.backFocusMm! > 55 && c.specs!.backFocusMm! <= 85)).toBe(true);
    expect(correctors.some((c) => c.front?.interface === "2in-24tpi" && Math.abs(c.specs!.backFocusMm! - 105) <= 5)).toBe(true);
  });

  it("every camera front is female, and astronomy cameras are 6.5, 12.5 or 17.5 mm deep", () => {
    const cams = demoCatalog.filter((p) => p.kind === "camera");
    for (const c of cams) {
      expect(c.front?.gender, c.slug).toBe("female");
      expect(c.specs?.flangeDepthMm, c.slug).toBe(c.lengthMm);
    }
    const astro = cams.filter((c) => getInterface(c.front!.interface)?.kind === "thread" && c.front!.interface !== "M42x1");
    const depths = new Set(astro.map((c) => c.lengthMm));
    expect([...depths].sort((a, b) => a - b)).toEqual([6.5, 12.5, 17.5]);
    for (const f of ["M42x0.75", "M48x0.75"]) expect(astro.some((c) => c.front!.interface === f), f).toBe(true);
  });

  it("filter holders and guiders have the trade's thicknesses, and both kinds of faces", () => {
    const within = (kind: string, lo: number, hi: number) => {
      const parts = demoCatalog.filter((p) => p.kind === kind);
      expect(parts.length, kind).toBeGreaterThanOrEqual(3);
      for (const p of parts) {
        expect(p.lengthMm, p.slug).toBeGreaterThanOrEqual(lo);
        expect(p.lengthMm, p.slug).toBeLessThanOrEqual(hi);
        expect(p.front?.gender, p.slug).toBe("female");
      }
      expect(parts.some((p) => p.rear?.gender === "female"), `${kind} female/female`).toBe(true);
      expect(parts.some((p) => p.rear?.gender === "male"), `${kind} female/male`).toBe(true);
    };
    within("filter-wheel", 18, 25);
    within("filter-drawer", 15, 22);
    within("oag", 9, 17);
    const sizes = new Set(demoCatalog.filter((p) => p.kind === "filter-wheel" || p.kind === "filter-drawer")
      .map((p) => p.specs!.filterSize));
    for (const s of ["1.25in", "36mm", "2in"]) expect(sizes, s).toContain(s);
  });

  it("male–male couplers exist for the female-faced wheels, and plain rings of one thread are reversible", () => {
    for (const t of ["M42x0.75", "M48x0.75"]) {
      const c = demoCatalog.find((p) => p.front?.interface === t && p.rear?.interface === t
        && p.front.gender === "male" && p.rear.gender === "male");
      expect(c, t).toBeDefined();
      expect(c!.lengthMm).toBeLessThanOrEqual(2);
    }
    // Plain rings of one thread (spacers, couplers) mount either way round; focusing tubes,
    // barrels and devices do not (common practice).
    const threaded = (port: { interface: string } | null) => !!port && getInterface(port.interface)?.kind === "thread";
    for (const p of demoCatalog.filter((x) => x.reversible)) {
      expect(["spacer", "adapter"], p.slug).toContain(p.kind);
      expect(threaded(p.front) && threaded(p.rear), p.slug).toBe(true);
      expect(p.front!.interface, p.slug).toBe(p.rear!.interface);
    }
    for (const p of demoCatalog.filter((x) => x.kind === "spacer" && x.adjustMm === undefined)) expect(p.reversible, p.slug).toBe(true);
    // Step rings stay one way round: reversed, the narrow thread would face the sky.
    expect(demoCatalog.find((p) => p.model === "Step-Down M48 F to T-thread M")?.reversible).toBeFalsy();
  });

  it("has adjustable extensions", () => {
    const adjustable = demoCatalog.filter((p) => p.kind === "extension" && (p.adjustMm ?? 0) > 0);
    expect(adjustable.length).toBeGreaterThanOrEqual(3);
  });
});

// A small exhaustive checker, independent of lib/solver: enough to show each demo case does
// what its story says. Focus shift of a plate: t·(n − 1)/n with n = 1.5 (W. J. Smith,
// Modern Optical Engineering, §7.8); 2 mm → 0.667 mm.
type Port = { interface: string; gender: "male" | "female" };
// The kinds the planner lets the solver use as fillers.
const CONNECTOR_KINDS = [...PLANNER_CONNECTOR_KINDS];
const mates = (open: Port, front: Port | null) => !!front && front.interface === open.interface && front.gender !== open.gender;
const orientations = (p: PartInput) => (p.reversible ? [[p.front!, p.rear!], [p.rear!, p.front!]] : [[p.front!, p.rear!]]);

function check(c: DemoCase, extra: string[] = []) {
  const optics = get(c.optics);
  const camera = get(c.camera);
  const stations = c.stations.map(get);
  const connectors = c.parts
    ? [...c.parts, ...extra].map(get)
    : demoCatalog.filter((p) => CONNECTOR_KINDS.includes(p.kind));
  const target = optics.specs!.backFocusMm! + (c.filterThicknessMm * 0.5) / 1.5;
  const tol = optics.specs!.backFocusToleranceMm ?? 0.5;

  // Shortest chain: relax (leg, open port) labels until nothing shortens (lengths are ≥ 0).
  const best = new Map<string, [number, number, Port]>();
  let shortest = Infinity;
  let changed = true;
  const relax = (leg: number, p: Port, d: number) => {
    const k = `${leg}|${p.interface}|${p.gender}`;
    if (d < (best.get(k)?.[0] ?? Infinity)) { best.set(k, [d, leg, p]); changed = true; }
  };
  relax(0, optics.rear!, 0);
  while (changed) {
    changed = false;
    for (const [d, leg, port] of [...best.values()]) {
      for (const p of connectors) for (const [f, r] of orientations(p)) if (mates(port, f)) relax(leg, r, d + p.lengthMm);
      const s = stations[leg];
      if (s && mates(port, s.front)) relax(leg + 1, s.rear!, d + s.lengthMm);
      if (leg === stations.length && mates(port, camera.front)) shortest = Math.min(shortest, d + camera.lengthMm);
    }
  }

  // Fewest connectors (up to a bound) in any chain whose length range meets the window.
  const hi = target + tol + 1e-6;
  const lo = target - tol - 1e-6;
  const search = (leg: number, port: Port, min: number, max: number, left: number): boolean => {
    if (min > hi) return false;
    if (leg === stations.length && mates(port, camera.front)
      && min + camera.lengthMm <= hi && max + camera.lengthMm >= lo) return true;
    const s = stations[leg];
    if (s && mates(port, s.front) && search(leg + 1, s.rear!, min + s.lengthMm, max + s.lengthMm + (s.adjustMm ?? 0), left)) {
      return true;
    }
    return left > 0 && connectors.some((p) => orientations(p).some(([f, r]) =>
      mates(port, f) && search(leg, r, min + p.lengthMm, max + p.lengthMm + (p.adjustMm ?? 0), left - 1)));
  };
  let fewest: number | null = null;
  for (let n = 0; n <= (c.parts ? 8 : 3) && fewest === null; n++) if (search(0, optics.rear!, 0, 0, n)) fewest = n;
  const status = shortest === Infinity ? "no-connection" : shortest > hi ? "too-long" : fewest === null ? "out-of-reach" : "ok";
  return { status, shortest, target, fewest };
}

describe("demo cases", () => {
  const cases = Object.entries(DEMO_CASES) as [string, DemoCase][];

  it("name existing parts of the right kinds, joined to their telescopes", () => {
    for (const [name, c] of cases) {
      expect(get(c.optics).kind, name).toBe("optics");
      expect(get(c.camera).kind, name).toBe("camera");
      for (const s of c.stations) expect(["filter-wheel", "filter-drawer", "oag"], `${name} ${s}`).toContain(get(s).kind);
      for (const s of [...(c.parts ?? []), ...(c.remedy ?? [])]) expect(get(s).slug).toBe(s);
      if (c.telescope) expect(mates(get(c.telescope).rear!, get(c.optics).front), `${name} telescope`).toBe(true);
    }
  });

  it("ok cases fit the optics' image circle and the focuser's load", () => {
    for (const [name, c] of cases.filter(([, x]) => x.expect === "ok")) {
      const cam = get(c.camera).specs!;
      const main = get(c.telescope ?? c.optics).specs!;
      expect(Math.hypot(cam.sensorWidthMm!, cam.sensorHeightMm!), name).toBeLessThanOrEqual(get(c.optics).specs!.imageCircleMm!);
      const grams = [c.camera, ...c.stations].reduce((g, s) => g + (get(s).weightG ?? 0), 0);
      expect(grams, name).toBeLessThan(main.maxLoadG!);
    }
  });

  it("flagship: a 55 mm flattener with a male M48 rear, a wheel and a 17.5 mm M48 camera, 2 mm filters", () => {
    const f = DEMO_CASES.flagship;
    expect(get(f.optics).rear).toEqual({ interface: "M48x0.75", gender: "male" });
    expect(get(f.optics).specs!.backFocusMm).toBe(55);
    expect(get(f.camera).front).toEqual({ interface: "M48x0.75", gender: "female" });
    expect(get(f.camera).lengthMm).toBe(17.5);
    expect(get(f.stations[0]).kind).toBe("filter-wheel");
    expect(f.filterThicknessMm).toBe(2);
  });

  it.each(Object.keys(DEMO_CASES))("%s ends as its story says", (name) => {
    const c = (DEMO_CASES as Record<string, DemoCase>)[name];
    const plain = check(c);
    expect(plain.status).toBe(c.expect);
    const fixed = c.remedy ? check(c, c.remedy) : plain;
    if (c.remedy) expect(fixed.status, `${name} with its remedy`).toBe("ok");
    if (c.fewestParts !== undefined) expect(fixed.fewest, `${name}: connecting parts in the best chain`).toBe(c.fewestParts);
  });

  it("tooLong fails because the camera and wheel alone overshoot the short back focus", () => {
    const r = check(DEMO_CASES.tooLong);
    const wheelPlusCamera = get(DEMO_CASES.tooLong.stations[0]).lengthMm + get(DEMO_CASES.tooLong.camera).lengthMm;
    expect(wheelPlusCamera).toBeGreaterThan(r.target + 0.3);
    expect(r.shortest).toBeCloseTo(44, 6);
  });
});

describe("the planner's example plan", () => {
  it("opens the flagship case with parts of the demo catalog, and its link parses back to it", () => {
    const kinds = [EXAMPLE_PLAN.optics, EXAMPLE_PLAN.corrector, EXAMPLE_PLAN.camera, ...EXAMPLE_PLAN.stations].map((slug) => get(slug!).kind);
    expect(kinds).toEqual(["optics", "optics", "camera", "filter-wheel"]);
    expect(parsePlanParams(new URL(EXAMPLE_PLAN_HREF, "http://x").searchParams)).toEqual(EXAMPLE_PLAN);
  });
});
