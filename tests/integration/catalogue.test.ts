import { readdirSync, readFileSync } from "node:fs";
import { beforeAll, expect, test } from "vitest";
import { parse } from "yaml";
import { useMigratedDatabase } from "../helpers/database";
import { RouteClient } from "../helpers/route-client";
import { STANDING_CAUTION } from "~/vocabulary/caution";

useMigratedDatabase();

interface FileFacts {
  slug: string;
  title: string;
  tier: string;
  assembly: string;
  below_grade: string;
  zones: string[];
}

// The content files themselves are the oracle for the counts the database must produce.
const files: FileFacts[] = readdirSync("content/details")
  .filter((name) => name.endsWith(".md"))
  .map((name) => parse(readFileSync(`content/details/${name}`, "utf8").split(/^---$/m)[1]) as FileFacts);

beforeAll(async () => {
  const { importContent } = await import("~/catalogue/import.server");
  await importContent("content");
});

async function api(path: string, init?: RequestInit) {
  const url = new URL(path, "http://test.local");
  const request = new Request(url, init);
  const visitor = new RouteClient();
  // API routes answer Responses; respond() runs them behind the root middleware, as the server does.
  if (url.pathname === "/api/details")
    return (await visitor.respond((await import("~/routes/api/details")).loader, request, {})) as Response;
  const check = /^\/api\/details\/([^/]+)\/check$/.exec(url.pathname);
  if (check)
    return (await visitor.respond((await import("~/routes/api/detail-check")).action, request, {
      slug: check[1],
    })) as Response;
  const one = /^\/api\/details\/([^/]+)$/.exec(url.pathname);
  if (one)
    return (await visitor.respond((await import("~/routes/api/detail")).loader, request, { slug: one[1] })) as Response;
  throw new Error(`no route for ${path}`);
}

test("facet counts agree with the content files, for every tier and assembly", async () => {
  const body = await (await api("/api/details")).json();
  expect(body.total).toBe(files.length);
  for (const tier of ["free", "premium"]) {
    const expected = files.filter((f) => f.tier === tier).length;
    expect(body.facets.tier.find((f: { value: string }) => f.value === tier)?.count ?? 0).toBe(expected);
  }
  for (const facet of body.facets.assembly as { value: string; count: number }[]) {
    expect(facet.count).toBe(files.filter((f) => f.assembly === facet.value).length);
  }
  expect(body.caution).toBe(STANDING_CAUTION);
});

test("a zone filter narrows results, and the zone facet still counts the other zones", async () => {
  const body = await (await api("/api/details?zone=5A")).json();
  const expected = files.filter((f) => f.zones.includes("5A"));
  expect(body.total).toBe(expected.length);
  const zone6A = body.facets.zone.find((f: { value: string }) => f.value === "6A");
  expect(zone6A?.count ?? 0).toBe(files.filter((f) => f.zones.includes("6A")).length);
  // Other facets are counted within the zone filter.
  const freeIn5A = body.facets.tier.find((f: { value: string }) => f.value === "free")?.count ?? 0;
  expect(freeIn5A).toBe(expected.filter((f) => f.tier === "free").length);
});

test("filters combine across facets and values within a facet are alternatives", async () => {
  const body = await (await api("/api/details?below-grade=basement&below-grade=sealed-crawlspace&tier=free")).json();
  const expected = files.filter((f) => ["basement", "sealed-crawlspace"].includes(f.below_grade) && f.tier === "free");
  expect(body.total).toBe(expected.length);
  expect(body.cards.map((c: { slug: string }) => c.slug).sort()).toEqual(expected.map((f) => f.slug).sort());
});

interface Card {
  slug: string;
  title: string;
  summary: string;
}

test("full-text search finds details by trade words and their synonyms", async () => {
  const titled = files
    .filter((f) => /crawlspace/i.test(f.title))
    .map((f) => f.slug)
    .sort();
  expect(titled.length).toBeGreaterThan(0);
  // "crawl space" (two words) finds what is written "crawlspace", through the synonym table.
  const crawl = await (await api("/api/details?q=crawl+space")).json();
  expect(crawl.sort).toBe("relevance");
  const found = (crawl.cards as Card[]).map((c) => c.slug);
  for (const slug of titled) expect(found).toContain(slug);
  // Best match first: a title that names it outranks a passing mention.
  expect(crawl.cards[0].title).toMatch(/crawl/i);
  const nothing = await (await api("/api/details?q=zzzyqx")).json();
  expect(nothing.total).toBe(0);
});

test("text and facets combine, facet counts follow the text, and other sorts apply to the matches", async () => {
  const all = await (await api("/api/details?q=foam")).json();
  const premium = await (await api("/api/details?q=foam&tier=premium&sort=title")).json();
  expect(premium.total).toBe(all.facets.tier.find((f: { value: string }) => f.value === "premium").count);
  const titles = (premium.cards as Card[]).map((c) => c.title);
  expect(titles).toEqual([...titles].sort((a, b) => a.localeCompare(b, "en")));
  for (const card of premium.cards as Card[]) expect(files.find((f) => f.slug === card.slug)?.tier).toBe("premium");
});

test("bad parameters answer 400 with a JSON reason naming the parameter", async () => {
  const response = await api("/api/details?zone=9Z&sort=loudest");
  expect(response.status).toBe(400);
  const body = await response.json();
  expect(body.error).toBe("invalid_query");
  expect(body.problems.map((p: { param: string }) => p.param).sort()).toEqual(["sort", "zone"]);
});

test("a premium detail is refused to a visitor with 403 and never carries its body or layers", async () => {
  const premium = files.find((f) => f.tier === "premium")!;
  const response = await api(`/api/details/${premium.slug}`);
  expect(response.status).toBe(403);
  const text = await response.text();
  expect(text).not.toContain("Install sequence");
  const refusal = JSON.parse(text);
  expect(refusal.preview.slug).toBe(premium.slug);
  expect(refusal.error).toBe("premium_required");
  expect(refusal.offers[0]).toEqual({ label: "See plans", href: "/pricing" });
  const check = await api(`/api/details/${premium.slug}/check`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({ zone: "5A" }),
  });
  expect(check.status).toBe(403);
  // The same refusal everywhere premium content is asked for (the pack and drawing refusals are in payments and desk tests).
  expect(await check.json()).toMatchObject({ error: "premium_required", offers: refusal.offers });
});

test("a free detail is served whole, and its site check answers with the engine's result", async () => {
  const free = files.find((f) => f.tier === "free")!;
  const response = await api(`/api/details/${free.slug}`);
  expect(response.status).toBe(200);
  const { detail } = await response.json();
  expect(detail.full.bodyHtml).toContain("<h2");
  const check = await api(`/api/details/${free.slug}/check`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({ zone: free.zones[0], units: "si" }),
  });
  expect(check.status).toBe(200);
  const { result } = await check.json();
  expect(result.site.zone).toBe(free.zones[0]);
  expect(result.thermal.rsi).toBeGreaterThan(0);
  expect(result.caution).toMatch(/code/i);
});

test("a site check with bad input answers 400 with field errors, and unknown slugs 404", async () => {
  const free = files.find((f) => f.tier === "free")!;
  const bad = await api(`/api/details/${free.slug}/check`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({ hdd: -5, indoorRh: 140 }),
  });
  expect(bad.status).toBe(400);
  const body = await bad.json();
  expect(Object.keys(body.fieldErrors).sort()).toEqual(expect.arrayContaining(["hdd", "indoorRh"]));
  expect((await api("/api/details/no-such-detail")).status).toBe(404);
});
