import { beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, Client } from "../support/http";
import { flagshipRequest, saveBuild, viewers, type Viewers, type Visibility } from "./builds-support";

let v: Viewers & { admin: Client };
const slugs = {} as Record<Visibility, string>;

beforeAll(async () => {
  v = await viewers();
  for (const vis of ["private", "unlisted", "public"] as const) slugs[vis] = await saveBuild(v.owner, vis);
});

describe("saving a build", () => {
  it("refuses a signed-out save with 401", async () => {
    const res = await new Client().post("/api/v1/builds", { title: "Nope", visibility: "public", request: flagshipRequest, solutionIndex: 0 });
    expect(res.status).toBe(401);
  });

  it("saves the member's chosen solution as solved again on the server, with a short unguessable link", async () => {
    const res = await v.owner.post("/api/v1/builds", { title: "Flagship, second choice", visibility: "unlisted", request: flagshipRequest, solutionIndex: 1 });
    expect(res.status).toBe(201);
    const { slug, url } = await res.json();
    expect(slug).toMatch(/^[1-9A-HJ-NP-Za-km-z]{8}$/);
    expect(url).toBe(`${BASE_URL}/b/${slug}`);

    const build = await (await v.owner.get(`/api/v1/builds/${slug}`)).json();
    expect(build.solutionIndex).toBe(1);
    expect(build.chain).toEqual(build.result.solutions[1]);
    expect(build.result.status).toBe("ok");
    expect(build.result.context.catalogVersion).toBeGreaterThan(0);
    expect(build.partIds).toEqual(expect.arrayContaining([flagshipRequest.optics.partId, flagshipRequest.corrector.partId, flagshipRequest.camera.partId, ...flagshipRequest.stations.map((s) => s.partId)]));
    for (const step of build.chain.steps) expect(build.partIds).toContain(step.partId.replace(/~owned$/, ""));
    expect(build).toMatchObject({ endorsed: false, fits: true, hidden: false, threads: [], owner: { name: "Ines Varga" } });
    expect(build.audit).toBeUndefined();
  });

  it("defaults to an unlisted build of the best solution drawn from the whole catalog", async () => {
    const { source: _source, ...bare } = flagshipRequest;
    const res = await v.owner.post("/api/v1/builds", { title: "Bare plan", request: bare });
    expect(res.status).toBe(201);
    const build = await (await v.owner.get(`/api/v1/builds/${(await res.json()).slug}`)).json();
    expect(build).toMatchObject({ visibility: "unlisted", solutionIndex: 0, request: { source: { kind: "catalog" } } });
  });

  it("never takes a result from the client", async () => {
    const res = await v.owner.post("/api/v1/builds", { title: "Forged", visibility: "public", request: flagshipRequest, solutionIndex: 0, result: { solutions: [] } });
    expect(res.status).toBe(400);
  });

  it("answers 400 with a field error for a solution index out of range, a bad request or a missing title", async () => {
    const range = await v.owner.post("/api/v1/builds", { title: "Too far", visibility: "public", request: flagshipRequest, solutionIndex: 40 });
    expect(range.status).toBe(400);
    expect((await range.json()).error.fields.solutionIndex).toBeTruthy();

    const bad = await v.owner.post("/api/v1/builds", { title: "Bad", visibility: "public", request: { ...flagshipRequest, camera: { partId: "" } }, solutionIndex: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields).some((k) => k.startsWith("request.camera"))).toBe(true);

    const untitled = await v.owner.post("/api/v1/builds", { title: " ", visibility: "public", request: flagshipRequest, solutionIndex: 0 });
    expect(untitled.status).toBe(400);
    expect((await untitled.json()).error.fields.title).toBeTruthy();

    const vis = await v.owner.post("/api/v1/builds", { title: "Odd", visibility: "friends", request: flagshipRequest, solutionIndex: 0 });
    expect(vis.status).toBe(400);
  });

  it("refuses a plan with no solution to save", async () => {
    const tooLong = { ...flagshipRequest, filters: [], backFocusToleranceMm: 0.01, stations: [...flagshipRequest.stations, ...flagshipRequest.stations, ...flagshipRequest.stations] };
    const res = await v.owner.post("/api/v1/builds", { title: "Impossible", visibility: "public", request: tooLong, solutionIndex: 0 });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields.solutionIndex).toBeTruthy();
  });
});

// Who sees what: [visibility][viewer] → status.
const READ: Record<Visibility, Record<keyof Viewers, number>> = {
  private: { owner: 200, other: 404, moderator: 200, anon: 404 },
  unlisted: { owner: 200, other: 200, moderator: 200, anon: 200 },
  public: { owner: 200, other: 200, moderator: 200, anon: 200 },
};
const PATCH: Record<Visibility, Record<keyof Viewers, number>> = {
  private: { owner: 200, other: 404, moderator: 403, anon: 401 },
  unlisted: { owner: 200, other: 403, moderator: 403, anon: 401 },
  public: { owner: 200, other: 403, moderator: 403, anon: 401 },
};
const WHO = ["owner", "other", "moderator", "anon"] as const;

describe("visibility × role on every build route", () => {
  for (const vis of ["private", "unlisted", "public"] as const) {
    for (const who of WHO) {
      it(`${vis} build, ${who}: JSON ${READ[vis][who]}, page ${READ[vis][who]}, preview ${vis === "private" ? 404 : 200}`, async () => {
        const json = await v[who].get(`/api/v1/builds/${slugs[vis]}`);
        expect(json.status).toBe(READ[vis][who]);
        if (json.status === 200) {
          const body = await json.json();
          expect(body.visibility).toBe(vis);
          expect(body.audit !== undefined).toBe(who === "moderator");
        }
        const page = await v[who].get(`/b/${slugs[vis]}`);
        expect(page.status).toBe(READ[vis][who]);
        const image = await v[who].get(`/b/${slugs[vis]}/opengraph-image`);
        expect(image.status).toBe(vis === "private" ? 404 : 200);
        if (vis !== "private") expect(image.headers.get("content-type")).toBe("image/png");
      });

      it(`${vis} build, ${who}: PATCH ${PATCH[vis][who]}; endorse, hide and threads ${who === "moderator" ? "allowed" : who === "anon" ? 401 : 403}`, async () => {
        const patch = await v[who].patch(`/api/v1/builds/${slugs[vis]}`, { notes: `Edited by ${who}` });
        expect(patch.status).toBe(PATCH[vis][who]);
        const gate = who === "moderator" ? null : who === "anon" ? 401 : 403;
        const calls: [string, string, unknown][] = [
          ["POST", "/endorse", undefined], ["DELETE", "/endorse", undefined],
          ["POST", "/hide", { reason: "Checking the matrix" }], ["DELETE", "/hide", undefined],
          ["POST", "/threads", { url: `https://forum.example/t/${vis}` }],
        ];
        for (const [method, path, json] of calls) {
          const res = await v[who].request(`/api/v1/builds/${slugs[vis]}${path}`, { method, json });
          if (gate) expect(res.status, `${method} ${path}`).toBe(gate);
          else expect(res.status, `${method} ${path}`).toBeLessThan(300);
        }
      });
    }
  }

  it("owners change only title, notes and visibility", async () => {
    const res = await v.owner.patch(`/api/v1/builds/${slugs.public}`, { title: "Renamed flagship", notes: null, visibility: "public" });
    expect(res.status).toBe(200);
    const after = await (await v.anon.get(`/api/v1/builds/${slugs.public}`)).json();
    expect(after).toMatchObject({ title: "Renamed flagship", notes: null });
    for (const body of [{ solutionIndex: 1 }, { result: {} }, { endorsed: true }, {}]) {
      expect((await v.owner.patch(`/api/v1/builds/${slugs.public}`, body)).status).toBe(400);
    }
  });

  it("deletes for the owner or an admin only", async () => {
    const mine = await saveBuild(v.owner, "public");
    expect((await v.anon.delete(`/api/v1/builds/${mine}`)).status).toBe(401);
    expect((await v.other.delete(`/api/v1/builds/${mine}`)).status).toBe(403);
    expect((await v.moderator.delete(`/api/v1/builds/${mine}`)).status).toBe(403);
    expect((await v.owner.delete(`/api/v1/builds/${mine}`)).status).toBe(204);
    expect((await v.owner.get(`/api/v1/builds/${mine}`)).status).toBe(404);

    const secret = await saveBuild(v.owner, "private");
    expect((await v.other.delete(`/api/v1/builds/${secret}`)).status).toBe(404);
    expect((await v.admin.delete(`/api/v1/builds/${secret}`)).status).toBe(204);
  });

  it("answers 404 for a link that never existed", async () => {
    expect((await v.anon.get("/api/v1/builds/zzzzzzzz")).status).toBe(404);
    expect((await v.anon.get("/b/zzzzzzzz")).status).toBe(404);
    expect((await v.anon.get("/b/zzzzzzzz/opengraph-image")).status).toBe(404);
  });
});

describe("the short-link page", () => {
  it("carries an absolute og:image that answers a PNG, and the share snippets", async () => {
    const html = await (await v.anon.get(`/b/${slugs.unlisted}`)).text();
    const og = html.match(/<meta property="og:image" content="([^"]+)"/)?.[1];
    expect(og).toMatch(new RegExp(`^https?://[^/]+/b/${slugs.unlisted}/opengraph-image`));
    const image = await fetch(og!.replace(/^https?:\/\/[^/]+/, BASE_URL));
    expect(image.status).toBe(200);
    expect(image.headers.get("content-type")).toBe("image/png");
    expect(new Uint8Array(await image.arrayBuffer()).slice(1, 4)).toEqual(new Uint8Array([0x50, 0x4e, 0x47]));
    expect(html).toContain("Copy Markdown");
    expect(html).toContain("Open in planner");
    expect(html).toMatch(/href="\/plan\?optics=/);
  });

  it("shows no og:image for a private build, even to its owner", async () => {
    const html = await (await v.owner.get(`/b/${slugs.private}`)).text();
    expect(html).not.toContain('property="og:image"');
  });
});
