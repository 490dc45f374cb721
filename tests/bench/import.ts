/**
 * The CSV import with a 100,000-row file, in this process so that its memory is what is measured: the file is stored,
 * read in a dry run, committed in one transaction and rolled back (which keeps the benchmark's catalogue as it was).
 * Run by `npm run bench:import` against the benchmark's own services. Prints rows per second and peak memory.
 */
import Papa from "papaparse";
import { sequelize, User } from "@/db";
import { dryRun, getImport, createImport, rollbackImport, runCommit, startCommit } from "@/lib/imports/imports";

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
await timed("commit (one transaction)", () => runCommit(actor, created.id), ROWS);
const committed = await getImport(actor, created.id, 0);
if (committed.status !== "committed") throw new Error(`The commit did not land: ${committed.errorMessage}`);
await timed("roll back", () => rollbackImport(actor, created.id), ROWS);
await sequelize.close();
