/**
 * Look-up and measured-size search under load, against the server `npm run bench` started on loopback with the
 * synthetic catalogue (SY-000001-A … SY-250000-E). Every run is bounded in time; nothing leaves 127.0.0.1.
 * Prints requests per second and p50/p95/p99 latency at 1 and 32 connections.
 */
import autocannon from "autocannon";

const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3200";
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
if (!/^http:\/\/(127\.0\.0\.1|localhost)(:\d+)?$/.test(APP_URL))
  throw new Error("The benchmark only targets a server on this machine.");

const PARTS = 250_000;
// Ids of 200 synthetic parts drawn at random, found by their numbers, for the part page's scenario.
const partIds: number[] = [];
for (let i = 0; i < 200; i += 1) {
  const g = 1 + Math.floor(Math.random() * PARTS);
  const found = await fetch(
    `${APP_URL}/api/parts/lookup?q=SY-${String(g).padStart(6, "0")}-${String.fromCharCode(65 + (g % 5))}&limit=1`,
  );
  partIds.push(((await found.json()) as { results: Array<{ id: number }> }).results[0].id);
}
const pick = () => 1 + Math.floor(Math.random() * PARTS);
const digits = (g: number) => String(g).padStart(6, "0");
const letter = (g: number) => String.fromCharCode(65 + (g % 5));
const SIZES = [
  [25, 52, 15],
  [30, 62, 16],
  [35, 72, 17],
  [20, 47, 14],
  [40, 80, 18],
  [25, 62, 17],
];

const scenarios: Array<{ name: string; path: () => string }> = [
  {
    name: "look-up, exact",
    path: () => {
      const g = pick();
      return `/api/parts/lookup?q=SY-${digits(g)}-${letter(g)}`;
    },
  },
  {
    name: "look-up, normalised",
    path: () => {
      const g = pick();
      return `/api/parts/lookup?q=${encodeURIComponent(`sy ${digits(g)} ${letter(g).toLowerCase()}`)}`;
    },
  },
  {
    name: "look-up, fuzzy (a digit missing)",
    path: () => {
      const g = pick();
      const d = digits(g);
      return `/api/parts/lookup?q=SY-${d.slice(0, 2)}${d.slice(3)}-${letter(g)}`;
    },
  },
  {
    name: "look-up, partial number (first four digits)",
    path: () => {
      const g = pick();
      return `/api/parts/lookup?q=SY-${digits(g).slice(0, 4)}`;
    },
  },
  { name: "look-up, words", path: () => `/api/parts/lookup?q=${encodeURIComponent(`synthetic part ${pick()}`)}` },
  {
    name: "part with its ranked crosses",
    path: () => `/api/parts/${partIds[Math.floor(Math.random() * partIds.length)]}`,
  },
  {
    name: "floor: a route with no database work",
    path: () => `/api/units/nominal?value=${(25 + Math.random()).toFixed(3)}&unit=mm`,
  },
  {
    name: "measured-size search",
    path: () => {
      const [d, D, B] = SIZES[Math.floor(Math.random() * SIZES.length)];
      return `/api/bearings/match?bore=${d + 0.02}&od=${D - 0.02}&width=${B}&unit=mm`;
    },
  },
];

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

async function measure(path: () => string, connections: number, seconds: number) {
  const times: number[] = [];
  let failures = 0;
  const instance = autocannon({
    url: APP_URL,
    connections,
    duration: seconds,
    requests: [{ setupRequest: (request: Record<string, unknown>) => ({ ...request, path: path() }) }],
  });
  instance.on("response", (_client: unknown, statusCode: number, _bytes: number, responseTime: number) => {
    if (statusCode !== 200) failures += 1;
    times.push(responseTime);
  });
  const result = await instance;
  times.sort((a, b) => a - b);
  return {
    rps: Math.round(result.requests.average),
    p50: percentile(times, 50),
    p95: percentile(times, 95),
    p99: percentile(times, 99),
    total: times.length,
    failures,
  };
}

console.log(
  `Understudy look-up benchmark: ${APP_URL}, ${SECONDS} s per run, ` +
    `synthetic catalogue of ${PARTS.toLocaleString("en")} parts\n`,
);
await measure(scenarios[0].path, 4, 2); // warm-up: connection pool, caches, JIT
const lines = [
  "| scenario | connections | requests/s | p50 ms | p95 ms | p99 ms | non-200 |",
  "|---|---:|---:|---:|---:|---:|---:|",
];
for (const scenario of scenarios) {
  for (const connections of [1, 32]) {
    const r = await measure(scenario.path, connections, SECONDS);
    const line =
      `| ${scenario.name} | ${connections} | ${r.rps} | ${r.p50.toFixed(1)} | ` +
      `${r.p95.toFixed(1)} | ${r.p99.toFixed(1)} | ${r.failures} |`;
    lines.push(line);
    console.log(line);
  }
}
console.log(`\n${lines.join("\n")}`);
