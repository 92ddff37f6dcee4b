// Demo builds, saved through the running app's own API the way people save them, so the
// stored results are exactly what the server solves. Idempotent: skipped when present.
import { DEMO_PASSWORD } from "./accounts";
import { DEMO_CASES, DEMO_FILTER_INDEX, type DemoCase } from "./catalog";

type Plan = { author: string; visibility: "public" | "unlisted"; endorse: boolean; title: string; notes: string; demo: DemoCase; threads?: string[] };

const PLANS: Plan[] = [
  {
    author: "moderator@trainyard.test", visibility: "public", endorse: true, demo: DEMO_CASES.flagship,
    title: "80 mm doublet, 1.0× flattener, 7-slot 2-inch wheel, 26M cooled camera",
    notes: "The answer to the most common question in the imaging section. Screw the two M48 spacers onto the flattener, then the wheel (female side to the spacers), then the camera. 2 mm filters add about 0.7 mm, which the spacing already counts.",
    threads: ["https://forum.example.org/t/what-spacers-for-my-80-ed-and-wheel/1182"],
  },
  {
    author: "moderator@trainyard.test", visibility: "public", endorse: true, demo: DEMO_CASES.twoStations,
    title: "Astrograph with off-axis guider and 2-inch filter drawer",
    notes: "Guider first, drawer second, so the guide camera sees past the filters. Check the guide camera's focus on the pick-off prism before the night.",
  },
  {
    author: "member@trainyard.test", visibility: "public", endorse: false, demo: DEMO_CASES.sctPrimeFocus,
    title: "8-inch SCT at 0.63× with a camera body on the EF bayonet",
    notes: "My first reduced SCT train. 105 mm from the reducer's rear thread to the sensor.",
  },
];

class Session {
  private cookie = "";
  constructor(private base: string) {}
  async send(path: string, method: string, body?: unknown) {
    const res = await fetch(`${this.base}${path}`, {
      method, headers: { "content-type": "application/json", origin: this.base, ...(this.cookie ? { cookie: this.cookie } : {}) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const set = res.headers.getSetCookie().map((c) => c.split(";")[0]).filter((c) => !c.endsWith("="));
    if (set.length) this.cookie = set.join("; ");
    return res;
  }
}

function requestFor(demo: DemoCase) {
  return {
    ...(demo.telescope ? { optics: { partId: demo.telescope }, corrector: { partId: demo.optics } } : { optics: { partId: demo.optics } }),
    camera: { partId: demo.camera },
    stations: demo.stations.map((partId) => ({ partId })),
    filters: demo.filterThicknessMm ? [{ thicknessMm: demo.filterThicknessMm, refractiveIndex: DEMO_FILTER_INDEX }] : [],
    source: { kind: "catalog" },
  };
}

export async function seedDemoBuilds(baseUrl: string, log: (m: string) => void = console.log) {
  const sessions = new Map<string, Session>();
  const as = async (email: string) => {
    if (!sessions.has(email)) {
      const s = new Session(baseUrl);
      const res = await s.send("/api/auth/sign-in/email", "POST", { email, password: DEMO_PASSWORD });
      if (!res.ok) throw new Error(`demo sign-in failed for ${email}: ${res.status}`);
      sessions.set(email, s);
    }
    return sessions.get(email)!;
  };
  // Every page of the author's builds, not just the first: a busy author has more than 100.
  const titlesOf = async (author: Session) => {
    const titles = new Set<string>();
    let cursor: string | null = null;
    do {
      const res = await author.send(`/api/v1/builds?mine=1&limit=100${cursor ? `&cursor=${cursor}` : ""}`, "GET");
      if (!res.ok) throw new Error(`listing builds failed: ${res.status}`);
      const page = await res.json() as { items: { title: string }[]; nextCursor: string | null };
      for (const b of page.items) titles.add(b.title);
      cursor = page.nextCursor;
    } while (cursor);
    return titles;
  };
  let added = 0;
  for (const plan of PLANS) {
    const author = await as(plan.author);
    if ((await titlesOf(author)).has(plan.title)) continue;
    // Like a careful person: of the ranked answers, take the first with the fewest warnings.
    const solved = await (await author.send("/api/v1/solve", "POST", requestFor(plan.demo))).json() as { solutions?: { warnings: unknown[] }[] };
    const warningsOf = (solved.solutions ?? []).map((c) => c.warnings.length);
    const solutionIndex = warningsOf.length ? warningsOf.indexOf(Math.min(...warningsOf)) : 0;
    const res = await author.send("/api/v1/builds", "POST", { title: plan.title, notes: plan.notes, visibility: plan.visibility, request: requestFor(plan.demo), solutionIndex });
    if (res.status !== 201) { log(`[seed] demo build "${plan.title}" was not saved: ${res.status} ${await res.text()}`); continue; }
    const { slug } = await res.json() as { slug: string };
    added++;
    if (plan.endorse) {
      const mod = await as("moderator@trainyard.test");
      await mod.send(`/api/v1/builds/${slug}/endorse`, "POST");
      for (const url of plan.threads ?? []) await mod.send(`/api/v1/builds/${slug}/threads`, "POST", { url });
    }
  }
  log(`[seed] demo builds ready (${added} added)`);
}
