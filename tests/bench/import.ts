/**
 * The CSV import with a 100,000-row file, in this process so that its memory is what is measured: the file is stored,
 * read in a dry run, committed in one transaction and rolled back (which keeps the benchmark's catalogue as it was).
 * Run by `npm run bench:import` against the benchmark's own services. Prints rows per second and peak memory.
 */
import Papa from "papaparse";
import { sequelize, User } from "@/db";
import { Maker, StandardPart } from "@/db";
import { searchForms } from "@/lib/catalogue/normalise";
import { dryRun, getImport, createImport, rollbackImport, runCommit, startCommit } from "@/lib/imports/imports";
import { copyRows, takeIds } from "@/lib/imports/write";

const ROWS = Number(process.env.BENCH_IMPORT_ROWS ?? 100_000);
// Deep groove ball bearings with their ISO 15 boundary dimensions (DIN 625-1 via BOLTS, as in the unit tests).
const BEARINGS: Array<[string, number, number, number]> = [
  ["6203-2RS", 17, 40, 12],
  ["6204-2RS", 20, 47, 14],
  ["6205-2RS", 25, 52, 15],
  ["6206-2RS", 30, 62, 16],
  ["6304-2RS", 20, 52, 15],
  ["6305-2RS", 25, 62, 17],
  ["6005-2RS", 25, 47, 12],
  ["6006-2RS", 30, 55, 13],
];

/** An invented club spreadsheet: new numbers of the three demo makers, one row in fifty deliberately wrong. */
function buildFile(rows: number): Buffer {
  const makers = ["Corvane Tractor Works", "Halvard Maskinfabrik", "Pellworth & Sons"];
  const data: string[][] = [];
  for (let i = 0; i < rows; i += 1) {
    const [designation, d, D, B] = BEARINGS[i % BEARINGS.length];
    const bad = i % 50 === 49;
    data.push([
      makers[i % 3],
      `BX-${String(i).padStart(6, "0")}`,
      `Bench bearing ${i % 97}`,
      "bearing",
      String(d),
      bad ? String(D - 5) : String(D),
      String(B),
      designation,
      i % 3 === 0 ? "direct" : "",
      "",
    ]);
  }
  return Buffer.from(
    Papa.unparse(
      {
        fields: [
          "Maker",
          "Part No.",
          "Description",
          "Kind",
          "Bore (mm)",
          "OD (mm)",
          "Width (mm)",
          "Standard designation",
          "Fit",
          "Notes",
        ],
        data,
      },
      { newline: "\r\n" },
    ),
  );
}

function memoryWatch() {
  let peakRss = 0;
  let peakHeap = 0;
  const sample = () => {
    const m = process.memoryUsage();
    peakRss = Math.max(peakRss, m.rss);
    peakHeap = Math.max(peakHeap, m.heapUsed);
  };
  sample();
  const timer = setInterval(sample, 50);
  return {
    stop() {
      clearInterval(timer);
      sample();
      return { rssMb: peakRss / 1024 / 1024, heapMb: peakHeap / 1024 / 1024 };
    },
  };
}

async function timed<T>(label: string, work: () => Promise<T>, rows: number) {
  const watch = memoryWatch();
  const started = performance.now();
  const result = await work();
  const seconds = (performance.now() - started) / 1000;
  const memory = watch.stop();
  console.log(
    `${label.padEnd(24)} ${seconds.toFixed(1).padStart(6)} s ${Math.round(rows / seconds)
      .toLocaleString("en-GB")
      .padStart(9)} rows/s   peak RSS ${memory.rssMb.toFixed(0)} MB, heap ${memory.heapMb.toFixed(0)} MB`,
  );
  return result;
}

const admin = await User.findOne({ where: { role: "admin" } });
if (!admin) throw new Error("The benchmark database has no admin account; run npm run bench once to seed it.");
const actor = { id: admin.id, role: "admin" as const };

const file = buildFile(ROWS);
console.log(
  `CSV import, ${ROWS.toLocaleString("en-GB")} rows ` +
    `(${(file.length / 1024 / 1024).toFixed(1)} MB), Node ` +
    `${process.version}, ${new Date().toISOString()}`,
);
const before = process.memoryUsage();
console.log(
  `memory before: RSS ${(before.rss / 1024 / 1024).toFixed(0)} MB, heap ` +
    `${(before.heapUsed / 1024 / 1024).toFixed(0)} MB (the file itself is ` +
    `held once, as an upload is)`,
);

const created = await timed(
  "store the original",
  () => createImport(actor, { name: "bench-100k.csv", bytes: file }, "catalogue"),
  ROWS,
);
await timed("dry run", () => dryRun(created.id), ROWS);
const parsed = await getImport(actor, created.id, 0);
console.log(`  counts: ${JSON.stringify(parsed.counts)}`);
await startCommit(actor, created.id);
const commitStarted = performance.now();
await timed("commit (one transaction)", () => runCommit(actor, created.id), ROWS);
const committedSeconds = (performance.now() - commitStarted) / 1000;
const committed = await getImport(actor, created.id, 0);
if (committed.status !== "committed") throw new Error(`The commit did not land: ${committed.errorMessage}`);
await timed("roll back", () => rollbackImport(actor, created.id), ROWS);

/**
 * The floor for the commit: the same rows loaded as a database administrator would with COPY alone (read the file,
 * work out each number's searchable forms, COPY the parts and their crosses in one transaction, then roll back),
 * with none of the import's checks, plans or change log.
 */
async function copyLoad(): Promise<number> {
  const makers = new Map((await Maker.findAll()).map((m) => [m.name, { id: m.id, prefixes: m.prefixes ?? [] }]));
  const standards = new Map(
    (await StandardPart.findAll({ where: { kind: "bearing" } })).map((s) => [s.designation, s.id]),
  );
  const parsed = Papa.parse<string[]>(file.toString("utf8"), { skipEmptyLines: true }).data.slice(1);
  const good = parsed.filter((_, i) => i % 50 !== 49);
  let loaded = 0;
  await sequelize
    .transaction(async (transaction) => {
      const ids = await takeIds(transaction, "original_parts_id_seq", good.length);
      const now = new Date().toISOString();
      const parts = good.map((r, i) => {
        const maker = makers.get(r[0])!;
        const forms = searchForms(r[1], maker.prefixes);
        return [ids[i], maker.id, r[1], forms.normalised, forms.key, r[2], "bearing", +r[4], +r[5], +r[6], null, null];
      });
      const columns = ["id", "maker_id", "number", "number_normalised", "number_key", "description", "category"];
      columns.push("inner_mm", "outer_mm", "width_mm", "length_mm", "dimensions_note");
      await copyRows(transaction, "original_parts", columns, parts, now);
      const crossIds = await takeIds(transaction, "crosses_id_seq", good.length);
      const crosses = good.map((r, i) => [
        crossIds[i],
        ids[i],
        standards.get(r[7]) ?? null,
        "direct",
        null,
        "approved",
        "import",
      ]);
      const crossColumns = ["id", "original_part_id", "standard_part_id", "fit", "notes", "status", "origin"];
      await copyRows(transaction, "crosses", crossColumns, crosses, now);
      loaded = good.length;
      throw new Error("rolled back on purpose");
    })
    .catch((error: Error) => {
      if (error.message !== "rolled back on purpose") throw error;
    });
  return loaded;
}

const copyStarted = performance.now();
const copied = await copyLoad();
const copySeconds = (performance.now() - copyStarted) / 1000;
console.log(
  `${"COPY load, same rows".padEnd(24)} ${copySeconds.toFixed(1).padStart(6)} s ${Math.round(copied / copySeconds)
    .toLocaleString("en-GB")
    .padStart(9)} rows/s   (parts and crosses only, no checks, rolled back)`,
);
console.log(`commit ÷ COPY load: ${(committedSeconds / copySeconds).toFixed(2)} (the aim: at most 2)`);
await sequelize.close();
