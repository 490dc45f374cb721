/**
 * The look-up and measured-size benchmark, run by `npm run bench` against two app servers on loopback: one over the
 * 250,000-part synthetic catalogue (SY-000001-A …), one over a 50,000-part one. For the three catalogue reads that
 * decide how the product scales (exact look-up, similar-number look-up, measured-size search) it alternates, in one
 * run and for each catalogue and connection count:
 *   - the app, through HTTP (autocannon);
 *   - PostgreSQL's own `pgbench` running the app's very statements, prepared, with the same parameters the app
 *     would bind (computed by the app's own functions and read by pgbench from a table of 2,000 draws);
 *   - the floor route, which does no database work (what the framework alone costs).
 * It prints the ratio app ÷ pgbench and the growth of p95 from 50,000 to 250,000 parts. Other look-ups run against
 * the app alone. Every run is bounded in time; nothing leaves 127.0.0.1.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import autocannon from "autocannon";
import pg from "pg";
import { PLAN_CACHE_MODE } from "@/db/sequelize";
import { NEAREST_SIZES_SQL, nearestSizesValues } from "@/lib/catalogue/find-by-size";
import {
  MAKER_PREFIXES_SQL,
  NUMBER_STATEMENT,
  numberStatementValues,
  prefixesOf,
  typedNumber,
} from "@/lib/catalogue/find-parts";
import { readTolerance } from "@/lib/validation/standards";

interface Target {
  parts: number;
  app: string;
  database: string;
}
const targets: Target[] = JSON.parse(process.env.BENCH_TARGETS ?? "[]");
const PGBENCH = process.env.PGBENCH ?? "pgbench";
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 2);
const DRAWS = 2_000;
const LIMIT = 10; // the look-up's default page
if (targets.length === 0) throw new Error("Run the benchmark through `npm run bench`, which starts what it measures.");
for (const t of targets) {
  if (!/^http:\/\/127\.0\.0\.1:\d+$/.test(t.app) || !new URL(t.database).hostname.startsWith("127.0.0.1"))
    throw new Error("The benchmark only targets servers on this machine.");
}

const digits = (g: number) => String(g).padStart(6, "0");
const letter = (g: number) => String.fromCharCode(65 + (g % 5));
const exactNumber = (g: number) => `SY-${digits(g)}-${letter(g)}`;
const missingDigit = (g: number) => `SY-${digits(g).slice(0, 2)}${digits(g).slice(3)}-${letter(g)}`;
// Standard deep groove ball bearings the synthetic parts take their sizes from, measured a little worn.
const SIZES = [
  [25, 52, 15],
  [30, 62, 16],
  [35, 72, 17],
  [20, 47, 14],
  [40, 80, 18],
  [25, 62, 17],
];

/** Draws the same random parts for the app and for pgbench, and writes pgbench's parameters into the database. */
async function prepare(target: Target) {
  const client = new pg.Client({ connectionString: target.database });
  await client.connect();
  try {
    const prefixes = prefixesOf((await client.query<{ id: number; prefix: string }>(MAKER_PREFIXES_SQL)).rows);
    const draws = Array.from({ length: DRAWS }, () => 1 + Math.floor(Math.random() * target.parts));
    const numberTable = async (table: string, typed: (g: number) => string) => {
      const columns = ["p1 text[]", "p2 text[]", "p3 boolean", "p4 text", "p5 text", "p6 integer", "p7 text"];
      columns.push("p8 text[]", "p9 integer", "p10 boolean", "p11 integer", "p12 integer[]", "p13 text", "p14 text");
      await client.query(`DROP TABLE IF EXISTS ${table}`);
      await client.query(`CREATE TABLE ${table} (i integer PRIMARY KEY, ${columns.join(", ")})`);
      for (const [i, g] of draws.entries()) {
        const values = numberStatementValues(typedNumber(typed(g), null, prefixes)!, LIMIT);
        const places = values.map((_, n) => `$${n + 2}`).join(", ");
        await client.query(`INSERT INTO ${table} VALUES ($1, ${places})`, [i + 1, ...values]);
      }
    };
    await numberTable("bench_exact", exactNumber);
    await numberTable("bench_similar", missingDigit);
    const sizeValues = SIZES.map(([d, D]) =>
      nearestSizesValues({
        category: "bearing",
        innerMm: d + 0.02,
        outerMm: D - 0.02,
        toleranceMm: readTolerance(undefined, "mm"),
      }),
    );
    await client.query("DROP TABLE IF EXISTS bench_size");
    await client.query(
      `CREATE TABLE bench_size (i integer PRIMARY KEY, category text, "inner" float8, "outer" float8, "innerLo" float8,
         "innerHi" float8, "outerLo" float8, "outerHi" float8, "limit" integer)`,
    );
    for (const [i, v] of sizeValues.entries()) {
      await client.query("INSERT INTO bench_size VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9)", [
        i + 1,
        v.category,
        v.inner,
        v.outer,
        v.innerLo,
        v.innerHi,
        v.outerLo,
        v.outerHi,
        v.limit,
      ]);
    }
    await client.query("ANALYZE bench_exact; ANALYZE bench_similar; ANALYZE bench_size");
    const ids = await client.query<{ id: number }>(
      "SELECT id FROM original_parts WHERE number LIKE 'SY-%' ORDER BY random() LIMIT 200",
    );
    return { draws, partIds: ids.rows.map((r) => r.id) };
  } finally {
    await client.end();
  }
}

/** A pgbench script: fetch one draw's parameters, then the app's own statement with them bound. */
function pgbenchScript(table: string, columns: string[], statement: string, draws: number): string {
  return [
    `\\set i random(1, ${draws})`,
    `SELECT ${columns.join(", ")} FROM ${table} WHERE i = :i \\gset`,
    `${statement.replace(/\s+/g, " ").trim()};`,
    "",
  ].join("\n");
}
const numbered = Array.from({ length: 14 }, (_, n) => `p${n + 1}`);
const numberScript = (table: string) =>
  pgbenchScript(table, numbered, NUMBER_STATEMENT.text.replace(/\$(\d+)/g, ":p$1"), DRAWS);
const sizeColumns = ["category", '"inner"', '"outer"', '"innerLo"', '"innerHi"', '"outerLo"', '"outerHi"', '"limit"'];
const sizeScript = pgbenchScript("bench_size", sizeColumns, NEAREST_SIZES_SQL, SIZES.length);

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

interface Measured {
  rate: number;
  p50: number;
  p95: number;
  failures: number;
}

async function measureApp(app: string, path: () => string, connections: number): Promise<Measured> {
  const times: number[] = [];
  let failures = 0;
  const instance = autocannon({
    url: app,
    connections,
    duration: SECONDS,
    requests: [{ setupRequest: (request: Record<string, unknown>) => ({ ...request, path: path() }) }],
  });
  instance.on("response", (_client: unknown, statusCode: number, _bytes: number, responseTime: number) => {
    if (statusCode !== 200) failures += 1;
    times.push(responseTime);
  });
  const result = await instance;
  times.sort((a, b) => a - b);
  return { rate: result.requests.average, p50: percentile(times, 50), p95: percentile(times, 95), failures };
}

/**
 * pgbench with the script, prepared statements, as many clients as the app had connections. The rate is that of
 * the app's statement alone: the transactions' rate scaled by the share of each transaction's time the statement
 * took (pgbench's per-statement latencies, -r); p95 is of whole transactions (parameters fetched and statement run).
 */
function measurePgbench(database: string, script: string, connections: number): Measured {
  const dir = mkdtempSync(path.join(tmpdir(), "understudy-pgbench-"));
  try {
    const file = path.join(dir, "script.sql");
    writeFileSync(file, script);
    const url = new URL(database);
    const out = execFileSync(
      PGBENCH,
      [
        "-n",
        "-M",
        "prepared",
        "-r",
        "-c",
        String(connections),
        "-j",
        String(Math.min(connections, 2)),
        "-T",
        String(SECONDS),
        "-l",
        `--log-prefix=${path.join(dir, "log")}`,
        "-f",
        file,
        "-h",
        url.hostname,
        "-p",
        url.port,
        "-U",
        decodeURIComponent(url.username),
        url.pathname.slice(1),
      ],
      {
        encoding: "utf8",
        // The same settings as the app's own connections (db/sequelize.ts).
        env: {
          ...process.env,
          PGPASSWORD: decodeURIComponent(url.password),
          PGOPTIONS: `-c plan_cache_mode=${PLAN_CACHE_MODE} -c pg_trgm.similarity_threshold=0.3`,
        },
      },
    );
    const tps = Number(/tps = ([\d.]+)/.exec(out)?.[1]);
    const average = Number(/latency average = ([\d.]+) ms/.exec(out)?.[1]);
    const statements = out.split(/statement latencies in milliseconds[^\n]*\n/)[1] ?? "";
    const latencies = [...statements.matchAll(/^\s+([\d.]+)\s+\d+\s+\S/gm)].map((m) => Number(m[1]));
    const statement = latencies[latencies.length - 1];
    const failures = Number(/number of failed transactions: (\d+)/.exec(out)?.[1] ?? 0);
    const times = readdirSync(dir)
      .filter((name) => name.startsWith("log"))
      .flatMap((name) => readFileSync(path.join(dir, name), "utf8").trim().split("\n"))
      .filter(Boolean)
      .map((line) => Number(line.split(" ")[2]) / 1000)
      .sort((a, b) => a - b);
    if (!Number.isFinite(tps) || !Number.isFinite(statement)) throw new Error(`pgbench gave no figures:\n${out}`);
    return {
      rate: (tps * average) / Math.max(statement, 1e-6),
      p50: percentile(times, 50),
      p95: percentile(times, 95),
      failures,
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

const mean = (values: number[]) => values.reduce((a, b) => a + b, 0) / values.length;
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const fixed = (n: number, digits = 1) => (Number.isFinite(n) ? n.toFixed(digits) : "—");

console.log(
  `Understudy benchmark: ${SECONDS} s a run, ${ROUNDS} rounds alternated; catalogues of ` +
    `${targets.map((t) => t.parts.toLocaleString("en")).join(" and ")} synthetic parts\n`,
);
const prepared = new Map<Target, Awaited<ReturnType<typeof prepare>>>();
for (const target of targets) prepared.set(target, await prepare(target));
const pick = <T>(list: T[]) => list[Math.floor(Math.random() * list.length)];

const paired: Array<{ name: string; path: (draws: number[]) => string; script: string }> = [
  {
    name: "look-up, exact",
    path: (d) => `/api/parts/lookup?q=${exactNumber(pick(d))}`,
    script: numberScript("bench_exact"),
  },
  {
    name: "look-up, similar (a digit missing)",
    path: (d) => `/api/parts/lookup?q=${missingDigit(pick(d))}`,
    script: numberScript("bench_similar"),
  },
  {
    name: "measured-size search",
    path: () => {
      const [d, D, B] = pick(SIZES);
      return `/api/bearings/match?bore=${d + 0.02}&od=${D - 0.02}&width=${B}&unit=mm`;
    },
    script: sizeScript,
  },
];
const floorPath = () => `/api/units/nominal?value=${(25 + Math.random()).toFixed(3)}&unit=mm`;

// Warm-up: connection pools, prepared statements, caches, JIT.
for (const target of targets) await measureApp(target.app, () => paired[0].path(prepared.get(target)!.draws), 4);

type Row = { name: string; parts: number; connections: number; app: Measured; pgbench: Measured; floor: Measured };
const rows: Row[] = [];
for (const scenario of paired) {
  for (const target of targets) {
    for (const connections of [1, 32]) {
      const app: Measured[] = [];
      const base: Measured[] = [];
      const floor: Measured[] = [];
      for (let round = 0; round < ROUNDS; round += 1) {
        app.push(await measureApp(target.app, () => scenario.path(prepared.get(target)!.draws), connections));
        base.push(measurePgbench(target.database, scenario.script, connections));
        floor.push(await measureApp(target.app, floorPath, connections));
      }
      const combine = (list: Measured[]): Measured => ({
        rate: mean(list.map((m) => m.rate)),
        p50: median(list.map((m) => m.p50)),
        p95: median(list.map((m) => m.p95)),
        failures: list.reduce((sum, m) => sum + m.failures, 0),
      });
      const row = {
        name: scenario.name,
        parts: target.parts,
        connections,
        app: combine(app),
        pgbench: combine(base),
        floor: combine(floor),
      };
      rows.push(row);
      console.log(
        `${row.name}, ${row.parts.toLocaleString("en")} parts, ${connections} conn: app ${fixed(row.app.rate, 0)}/s ` +
          `p95 ${fixed(row.app.p95)} ms; pgbench ${fixed(row.pgbench.rate, 0)}/s p95 ${fixed(row.pgbench.p95)} ms; ` +
          `floor ${fixed(row.floor.rate, 0)}/s`,
      );
    }
  }
}

// The other look-ups, against the app alone, on the largest catalogue.
const largest = targets.reduce((a, b) => (b.parts > a.parts ? b : a));
const { draws, partIds } = prepared.get(largest)!;
const alone: Array<{ name: string; path: () => string }> = [
  {
    name: "look-up, normalised",
    path: () => `/api/parts/lookup?q=${encodeURIComponent(`sy ${digits(pick(draws))} a`)}`,
  },
  { name: "look-up, partial number", path: () => `/api/parts/lookup?q=SY-${digits(pick(draws)).slice(0, 4)}` },
  { name: "look-up, words", path: () => `/api/parts/lookup?q=${encodeURIComponent(`synthetic part ${pick(draws)}`)}` },
  { name: "part with its ranked crosses", path: () => `/api/parts/${pick(partIds)}` },
];
const aloneRows: Array<{ name: string; connections: number; app: Measured }> = [];
for (const scenario of alone) {
  for (const connections of [1, 32]) {
    aloneRows.push({
      name: scenario.name,
      connections,
      app: await measureApp(largest.app, scenario.path, connections),
    });
  }
}

const table = [
  "| work | parts | conn | app req/s | app p95 ms | pgbench stmt/s | pgbench p95 ms | app ÷ pgbench | floor req/s | " +
    "app ÷ floor | non-200 |",
  "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|",
  ...rows.map(
    (r) =>
      `| ${r.name} | ${r.parts.toLocaleString("en")} | ${r.connections} | ${fixed(r.app.rate, 0)} | ` +
      `${fixed(r.app.p95)} | ${fixed(r.pgbench.rate, 0)} | ${fixed(r.pgbench.p95)} | ` +
      `${fixed(r.app.rate / r.pgbench.rate, 2)} | ${fixed(r.floor.rate, 0)} | ` +
      `${fixed(r.app.rate / r.floor.rate, 2)} | ` +
      `${r.app.failures + r.pgbench.failures} |`,
  ),
];
const [small, large] = [...targets].sort((a, b) => a.parts - b.parts);
const growth = [
  `| work | conn | app p95 growth ${small.parts / 1000}k → ${large.parts / 1000}k | pgbench p95 growth |`,
  "|---|---:|---:|---:|",
];
for (const scenario of paired) {
  for (const connections of [1, 32]) {
    const at = (t: Target) =>
      rows.find((r) => r.name === scenario.name && r.parts === t.parts && r.connections === connections)!;
    growth.push(
      `| ${scenario.name} | ${connections} | ×${fixed(at(large).app.p95 / at(small).app.p95, 2)} | ` +
        `×${fixed(at(large).pgbench.p95 / at(small).pgbench.p95, 2)} |`,
    );
  }
}
const others = [
  `| work (app only, ${large.parts.toLocaleString("en")} parts) | conn | req/s | p50 ms | p95 ms | non-200 |`,
  "|---|---:|---:|---:|---:|---:|",
  ...aloneRows.map(
    (r) =>
      `| ${r.name} | ${r.connections} | ${fixed(r.app.rate, 0)} | ${fixed(r.app.p50)} | ${fixed(r.app.p95)} | ` +
      `${r.app.failures} |`,
  ),
];
console.log(`\n${table.join("\n")}\n\n${growth.join("\n")}\n\n${others.join("\n")}`);
