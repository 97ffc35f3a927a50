// Catalogue benchmark: fills in 10,000 details into the database named by DB_* (a throwaway one from
// scripts/bench.sh), serves the built app, and measures search routes against a trivial route.
import { spawn } from "node:child_process";
import autocannon from "autocannon";
import { sequelize } from "../../app/db/sequelize.server.ts";
import { measureFirstLoad } from "./first-load.ts";
import { growLargeCatalogue } from "./grow-catalogue.ts";
import { freePort } from "../lib/free-port.ts";
import type { ClimateZoneId } from "../../app/vocabulary/climate-zones.ts";

const TARGET = Number(process.env.BENCH_DETAILS ?? 10000);
const DURATION = Number(process.env.BENCH_SECONDS ?? 8);

const growStart = performance.now();
const total = await growLargeCatalogue(sequelize, TARGET);
console.log(`added ${total} details in ${Math.round(performance.now() - growStart)} ms`);
await sequelize.close();

const port = await freePort();
const server = spawn(process.execPath, ["node_modules/@react-router/serve/bin.js", "./build/server/index.js"], {
  env: { ...process.env, NODE_ENV: "production", HOST: "127.0.0.1", PORT: String(port) },
  stdio: ["ignore", "ignore", "inherit"],
});
const base = `http://127.0.0.1:${port}`;
for (let i = 0; i < 200; i++) {
  try {
    if ((await fetch(`${base}/healthz`)).ok) break;
  } catch {}
  await new Promise((r) => setTimeout(r, 100));
}

// Varied searches defeat the per-process result cache: every request is a different combination.
// Eleven zones (a count the salts below rely on), checked against the vocabulary's zone ids.
const ZONES: ClimateZoneId[] = ["2A", "3A", "3B", "4A", "4C", "5A", "5B", "6A", "6B", "7", "8"];
const KINDS = ["above-grade-wall", "roof", "basement-wall", "slab", "crawlspace-wall", "rim-joist"];
const WORDS = ["foam", "crawlspace", "exterior", "cellulose", "drainage", "polyiso", "mineral wool", "spray foam"];
const SORTS = ["revised", "title", "r-value"];
// Each request a combination not asked before in this run (two zones, a kind, a sort, a page), so
// these rows measure the database path, not the result cache.
let n = 0;
const varied = (withText: boolean) => () => {
  n++;
  const pick = <T>(list: T[], salt: number) => list[Math.floor(n / salt) % list.length];
  const zones = `zone=${pick(ZONES, 1)}&zone=${pick(ZONES, 11)}`;
  const text = withText ? `&q=${encodeURIComponent(pick(WORDS, 121))}` : "";
  return `/api/details?${zones}&assembly=${pick(KINDS, 968)}&sort=${pick(SORTS, 5808)}&page=${1 + (n % 3)}${text}`;
};

const targets: [string, string | (() => string)][] = [
  ["trivial route (/healthz: one SELECT 1)", "/healthz"],
  ["API search, two facets", "/api/details?zone=5A&assembly=above-grade-wall"],
  ["API search, text + facets", "/api/details?q=exterior+foam&zone=6A&tier=premium"],
  ["catalogue page, two facets (SSR)", "/details?zone=5A&below-grade=basement"],
  ["catalogue page, text search (SSR)", "/details?q=crawlspace"],
  ["API search, varied facets (cache misses)", varied(false)],
  ["API search, varied text + facets (misses)", varied(true)],
];

interface Row {
  name: string;
  rps: number;
  p50: number;
  p95: number;
  errors: number;
}
const rows: Row[] = [];
for (const [name, path] of targets) {
  const options: autocannon.Options =
    typeof path === "string"
      ? { url: base + path }
      : { url: base, requests: [{ setupRequest: (request: autocannon.Request) => ({ ...request, path: path() }) }] };
  // Warm the route and the pool first.
  await autocannon({ ...options, connections: 4, duration: 1 });
  const result = await autocannon({ ...options, connections: 10, duration: DURATION });
  rows.push({
    name,
    rps: Math.round(result.requests.average),
    p50: result.latency.p50,
    p95: result.latency.p97_5 ?? result.latency.p99,
    errors: result.errors + result.non2xx,
  });
}
const slug = ((await (await fetch(`${base}/api/details?tier=free`)).json()) as { cards: { slug: string }[] }).cards[0]
  ?.slug;
const firstLoad = await measureFirstLoad(base, ["/", "/details", `/details/${slug}`]);
server.kill("SIGTERM");

console.log(
  `\nCatalogue over ${total} details, loopback, 10 connections, ${DURATION} s each (p95 column is autocannon's p97.5)`,
);
console.log(
  "route".padEnd(44),
  "req/s".padStart(7),
  "p50 ms".padStart(7),
  "p95 ms".padStart(7),
  "errors".padStart(7),
  "vs trivial".padStart(11),
);
const trivial = rows[0].rps;
for (const row of rows) {
  console.log(
    row.name.padEnd(44),
    String(row.rps).padStart(7),
    String(row.p50).padStart(7),
    String(row.p95).padStart(7),
    String(row.errors).padStart(7),
    `${Math.round((row.rps / trivial) * 100)} %`.padStart(11),
  );
}

console.log("\nFirst page load, gzipped JavaScript (fresh browser profile per page)");
for (const row of firstLoad)
  console.log(`  ${row.path.padEnd(60)} ${row.gzipKb.toFixed(1).padStart(7)} KB in ${row.files} files`);
