import { readFileSync } from "node:fs";
import iconv from "iconv-lite";
import Papa from "papaparse";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Cross, Import, Maker, OriginalPart, PartUsage, sequelize, StandardPart, Proposal, User } from "@/db";
import { runCommit, startCommit } from "@/lib/imports/imports";
import { catalogueWriter, type ChunkWriter } from "@/lib/imports/write";
import { getObject } from "@/lib/storage/s3";
import { APP_URL, send, signIn } from "../helpers/api";
import { settled, upload } from "../helpers/imports";

afterAll(() => sequelize.close());

const SAMPLE = readFileSync("fixtures/imports/club-interchange-sample.csv");

let admin: string;
let moderator: string;
let member: string;

beforeAll(async () => {
  [admin, moderator, member] = await Promise.all([
    signIn("admin@understudy.test"),
    signIn("moderator@understudy.test"),
    signIn("member@understudy.test"),
  ]);
});

async function catalogueSnapshot() {
  const [parts, crosses, standards, makers, usages] = await Promise.all([
    OriginalPart.count(),
    Cross.count(),
    StandardPart.count(),
    Maker.count(),
    PartUsage.count(),
  ]);
  const [[fits]] = (await sequelize.query(
    "SELECT md5(string_agg(id || ':' || fit || ':' || coalesce(notes, '') " +
      "|| ':' || status, ',' ORDER BY id)) AS h FROM crosses",
  )) as [Array<{ h: string }>, unknown];
  return { parts, crosses, standards, makers, usages, fits };
}

const hm210Fit = async () => {
  const [[row]] = (await sequelize.query(
    `SELECT c.fit FROM crosses c JOIN original_parts p ON p.id = c.original_part_id JOIN standard_parts s ON s.id =
      c.standard_part_id
     WHERE p.number = 'HM 210 007' AND s.designation = '6203-2Z'`,
  )) as [Array<{ fit: string }>, unknown];
  return row.fit;
};

describe("importing the sample club spreadsheet", () => {
  let firstId: number;
  let before: Awaited<ReturnType<typeof catalogueSnapshot>>;

  it("refuses visitors and members", async () => {
    expect((await upload("", SAMPLE)).status).toBe(401);
    expect((await upload(member, SAMPLE)).status).toBe(403);
    expect((await upload(moderator, SAMPLE, "club.csv", { target: "catalogue" })).status).toBe(403);
  });

  it(
    "stores the file as it came, then shows the dry run's counts and every " +
      "rejected row with its line, column and reason",
    async () => {
      before = await catalogueSnapshot();
      const response = await upload(admin, SAMPLE, "club-interchange-sample.csv");
      expect(response.status).toBe(202);
      firstId = response.body.id;
      // People are never shown where the file is stored; the record knows.
      expect(response.body).not.toHaveProperty("objectKey");
      const stored = await getObject((await Import.findByPk(firstId))!.objectKey);
      expect(Buffer.from(stored.body).equals(SAMPLE)).toBe(true);

      const body = await settled(admin, firstId);
      expect(body).toMatchObject({ status: "parsed", encoding: "utf-8", delimiter: ",", missing: [] });
      expect(body.mapping).toMatchObject({
        maker: "Maker",
        number: "Part No.",
        category: "Kind",
        innerMm: "Bore (mm)",
        outerMm: "OD (mm)",
        designation: "Standard designation",
        assembly: "Place on the machine",
      });
      expect(body.counts).toMatchObject({
        rows: 14,
        newParts: 3,
        newCrosses: 3,
        updates: 1,
        unchanged: 3,
        rejected: 7,
        newMakers: 1,
        newStandardParts: 1,
      });
      // The summary names what a commit would create, so a misspelt maker is seen before it becomes a second maker.
      expect(body.counts.newMakerNames).toEqual(["Brandholm Motorverk"]);
      expect(body.counts.newStandardPartNames).toEqual(["Ball bearing 6006"]);
      expect(body.rejections.map((r: { line: number; column: string }) => [r.line, r.column])).toEqual([
        [9, "Kind"],
        [10, "OD (mm)"],
        [11, "Bore (mm)"],
        [12, "Standard designation"],
        [13, "Standard designation"],
        [14, "Fit"],
        [15, "Description"],
      ]);
      const reasons = body.rejections.map((r: { reason: string }) => r.reason);
      expect(reasons[0]).toContain('Unknown category "sprocket"');
      // ISO 15:2017 series 62 (DIN 625-1 via BOLTS): 6205 is 25 × 52 × 15 mm, so an OD of 47 mm contradicts it.
      expect(reasons[1]).toContain("52 mm");
      expect(reasons[2]).toContain("cannot be read as a size");
      expect(reasons[3]).toContain("line 5");
      expect(await catalogueSnapshot()).toEqual(before);
    },
  );

  it("offers the rejected rows as a CSV, as they were in the file", async () => {
    const response = await send("get", `/api/imports/${firstId}/rejected.csv`, undefined, { cookie: admin });
    expect(response.status).toBe(200);
    expect(response.headers["content-type"]).toContain("text/csv");
    const parsed = Papa.parse<Record<string, string>>(response.text.replace(/^\uFEFF/, ""), {
      header: true,
      skipEmptyLines: true,
    });
    expect(parsed.data).toHaveLength(7);
    expect(parsed.data[1]).toMatchObject({ line: "10", column: "OD (mm)", "Part No.": "HM 299 001", "OD (mm)": "47" });
  });

  it("commits every accepted row in one go", async () => {
    expect((await send("post", `/api/imports/${firstId}/commit`, {}, { cookie: moderator })).status).toBe(403);
    const started = await send("post", `/api/imports/${firstId}/commit`, {}, { cookie: admin });
    expect(started.status).toBe(202);
    const body = await settled(admin, firstId);
    expect(body.status).toBe("committed");
    expect(body.committedCounts).toMatchObject({ newParts: 3, newCrosses: 3, updates: 1, unchanged: 3, rejected: 7 });
    expect((await send("post", `/api/imports/${firstId}/commit`, {}, { cookie: admin })).status).toBe(409);

    const after = await catalogueSnapshot();
    expect(after).toMatchObject({
      parts: before.parts + 3,
      crosses: before.crosses + 3,
      standards: before.standards + 1,
      makers: before.makers + 1,
      usages: before.usages + 1,
    });
    expect(await hm210Fit()).toBe("direct");
    const found = (await send("get", "/api/parts/lookup?q=7701.G4")).body.results[0];
    expect(found).toMatchObject({ number: "7701.G4", crossCount: 1 });
    const crawler = await send(
      "get",
      `/api/parts/${(await OriginalPart.findOne({ where: { number: "CV-9902-X" } }))!.id}`,
    );
    expect(crawler.body.whereUsed).toEqual([
      expect.objectContaining({ model: "K-40 Crawler", assembly: "Track roller" }),
    ]);

    const rows = await send("get", `/api/imports/${firstId}/rows`, undefined, { cookie: admin });
    expect(rows.body.changes.filter((c: { action: string }) => c.action === "update")).toEqual([
      expect.objectContaining({ line: 4, table: "crosses" }),
    ]);
  });

  it("changes nothing when the same file is imported again", async () => {
    const committed = await catalogueSnapshot();
    const again = await upload(admin, SAMPLE, "club-interchange-sample.csv");
    const parsed = await settled(admin, again.body.id);
    expect(parsed.counts).toMatchObject({
      rows: 14,
      newParts: 0,
      newCrosses: 0,
      updates: 0,
      unchanged: 7,
      rejected: 7,
      newMakers: 0,
      newStandardParts: 0,
    });
    await send("post", `/api/imports/${again.body.id}/commit`, {}, { cookie: admin });
    expect((await settled(admin, again.body.id)).status).toBe("committed");
    expect(await catalogueSnapshot()).toEqual(committed);
    expect((await send("get", `/api/imports/${again.body.id}/rows`, undefined, { cookie: admin })).body.total).toBe(0);
  });

  it("rolls the whole import back, for admins only", async () => {
    expect((await send("post", `/api/imports/${firstId}/rollback`, {}, { cookie: moderator })).status).toBe(403);
    const rolled = await send("post", `/api/imports/${firstId}/rollback`, {}, { cookie: admin });
    expect(rolled.status).toBe(200);
    expect(rolled.body).toMatchObject({ restored: 1, import: { status: "rolled_back" } });
    expect(await catalogueSnapshot()).toEqual(before);
    expect(await hm210Fit()).toBe("with_modification");
    expect((await send("post", `/api/imports/${firstId}/rollback`, {}, { cookie: admin })).status).toBe(409);
  });

  it("discards an import never committed, its file too, and keeps a committed one on record", async () => {
    const response = await upload(admin, SAMPLE, "to-discard.csv");
    const id = response.body.id as number;
    await settled(admin, id);
    const key = (await Import.findByPk(id))!.objectKey;
    expect((await send("delete", `/api/imports/${id}`, undefined, { cookie: member })).status).toBe(403);
    expect((await send("delete", `/api/imports/${id}`, undefined, { cookie: admin })).status).toBe(204);
    expect((await send("get", `/api/imports/${id}`, undefined, { cookie: admin })).status).toBe(404);
    await expect(getObject(key)).rejects.toThrow();
    expect((await send("delete", `/api/imports/${firstId}`, undefined, { cookie: admin })).status).toBe(409);
  });

  it("leaves the catalogue as it was when a commit fails part-way", async () => {
    const unchanged = await catalogueSnapshot();
    const response = await upload(admin, SAMPLE, "club-interchange-sample.csv");
    await settled(admin, response.body.id);
    const adminUser = await User.findOne({ where: { email: "admin@understudy.test" } });
    const actor = { id: adminUser!.id, role: "admin" as const };
    await startCommit(actor, response.body.id);
    // The commit's writer writes the first chunk, then the database fails: the transaction must take it all back.
    const failing: ChunkWriter = {
      async write(plan, context) {
        await catalogueWriter.write(plan, context);
        throw new Error("Forced failure after the first chunk");
      },
    };
    await runCommit(actor, response.body.id, { writer: failing });
    expect(await catalogueSnapshot()).toEqual(unchanged);
    const body = await settled(admin, response.body.id);
    expect(body.status).toBe("parsed");
    expect(body.errorMessage).toContain("nothing was changed");
  });
});

describe("other files", () => {
  it("reads a Windows-1252 file with semicolons and decimal commas", async () => {
    const text = [
      "Hersteller;Teilenummer;Bezeichnung;Kind;Bore (mm);OD (mm);Width (mm);Standard designation;Fit",
      "Halvard Maskinfabrik;HM 777 001;Lager für die Lüfterwelle, " +
        "Sønderby-Ausführung;bearing;17,0;40,0;12;6203-2RS;direct",
      "",
    ].join("\r\n");
    const bytes = iconv.encode(text, "win1252");
    expect(bytes.includes(0xfc)).toBe(true); // ü as one Windows-1252 byte, not UTF-8
    const response = await upload(admin, bytes, "lager.csv");
    const body = await settled(admin, response.body.id);
    expect(body).toMatchObject({
      encoding: "windows-1252",
      delimiter: ";",
      counts: { rows: 1, newParts: 1, newCrosses: 1, rejected: 0 },
    });
    await send("post", `/api/imports/${response.body.id}/commit`, {}, { cookie: admin });
    expect((await settled(admin, response.body.id)).status).toBe("committed");
    const part = await OriginalPart.findOne({ where: { number: "HM 777 001" } });
    expect(part!.description).toBe("Lager für die Lüfterwelle, Sønderby-Ausführung");
  });

  it("asks for a column it cannot match, takes a corrected mapping, and reuses a saved one", async () => {
    const text =
      "Maker,Stamped as,Description,Kind,Replacement\r\nPellworth & " +
      "Sons,8801.K1,Magneto drive bearing,bearing,6201-2RS\r\n";
    const first = await upload(admin, Buffer.from(text), "unusual.csv");
    const parsed = await settled(admin, first.body.id);
    expect(parsed.counts).toBeNull();
    expect(parsed.errorMessage).toContain("Factory number");
    const mapping = { ...parsed.mapping, number: "Stamped as" };
    expect((await send("patch", `/api/imports/${first.body.id}`, { mapping }, { cookie: admin })).status).toBe(202);
    expect((await settled(admin, first.body.id)).counts).toMatchObject({ rows: 1, newParts: 1 });

    const saved = await send(
      "post",
      "/api/import-mappings",
      { name: `Pellworth club ${Date.now()}`, mapping },
      { cookie: admin },
    );
    expect(saved.status).toBe(201);
    const second = await upload(admin, Buffer.from(text), "unusual-again.csv", { mappingId: String(saved.body.id) });
    expect((await settled(admin, second.body.id)).counts).toMatchObject({ rows: 1, newParts: 1 });
  });

  it("notices work cut off by a server stop, and lets the dry run run again", async () => {
    const response = await upload(admin, SAMPLE, "interrupted.csv");
    const id = response.body.id;
    await settled(admin, id);
    await sequelize.query(
      "UPDATE imports SET status = 'parsing', updated_at = now() - interval '11 minutes' WHERE id = :id",
      { replacements: { id } },
    );
    const stalled = (await send("get", `/api/imports/${id}`, undefined, { cookie: admin })).body;
    expect(stalled).toMatchObject({ status: "failed", errorMessage: expect.stringContaining("interrupted") });
    expect((await send("patch", `/api/imports/${id}`, { mapping: stalled.mapping }, { cookie: admin })).status).toBe(
      202,
    );
    expect((await settled(admin, id)).status).toBe("parsed");
  });

  it("refuses a file that is not a table, naming the file field", async () => {
    const response = await upload(admin, Buffer.from("just one line of words\n"), "notes.csv");
    expect(response.status).toBe(400);
    expect(response.body.field).toBe("file");
    const empty = await upload(admin, Buffer.alloc(0), "empty.csv");
    expect(empty.status).toBe(400);
  });

  it("lets a moderator import into the review queue, as proposals someone else decides", async () => {
    const number = `CV-88${Date.now() % 100000}-Q`;
    const text =
      `Maker,Part No.,Description,Kind,Standard designation,Fit\r\nCorvane ` +
      `Tractor Works,${number},Governor weight ` +
      `bearing,bearing,6200-2RS,direct\r\nNew Maker ` +
      `Ltd,NM-1,Something,bearing,6200,direct\r\n`;
    const response = await upload(moderator, Buffer.from(text), "for-review.csv");
    expect(response.status).toBe(202);
    expect(response.body.target).toBe("review_queue");
    const parsed = await settled(moderator, response.body.id);
    expect(parsed.counts).toMatchObject({ rows: 2, newCrosses: 1, rejected: 1 });
    expect(parsed.rejections[0]).toMatchObject({ line: 3, column: "Maker" });
    await send("post", `/api/imports/${response.body.id}/commit`, {}, { cookie: moderator });
    expect((await settled(moderator, response.body.id)).status).toBe("committed");
    expect(await OriginalPart.findOne({ where: { number } })).toBeNull();
    const queue = await send("get", `/api/proposals?q=${number}`, undefined, { cookie: admin });
    expect(queue.body.proposals).toEqual([
      expect.objectContaining({ partNumber: number, standard: "6200-2RS", submitter: "moderator@understudy.test" }),
    ]);
    const queued = await Proposal.findByPk(queue.body.proposals[0].id);
    const moderatorRow = await User.findOne({ where: { email: "moderator@understudy.test" } });
    expect(queued).toMatchObject({ status: "pending", userId: moderatorRow!.id, crossId: null });
  });
});

describe("POST /api/import-mappings", () => {
  it("replaces a saved mapping when one of the same name is saved again", async () => {
    const name = `Halvard club ${Date.now()}`;
    const first = await send(
      "post",
      "/api/import-mappings",
      { name, mapping: { number: "Part no", maker: "Maker" } },
      { cookie: admin },
    );
    expect(first.status).toBe(201);
    const again = await send(
      "post",
      "/api/import-mappings",
      { name, mapping: { number: "Stamped as", maker: "Maker" } },
      { cookie: admin },
    );
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    const { body } = await send("get", "/api/import-mappings", undefined, { cookie: admin });
    const saved = body.mappings.filter((m: { name: string }) => m.name === name);
    expect(saved).toHaveLength(1);
    expect(saved[0].mapping.number).toBe("Stamped as");
  });
});

describe("a commit cut off by a server stop", () => {
  it("can be committed again at once, as soon as nothing holds the commit's lock", async () => {
    const number = `CV-77${Date.now() % 100000}-Z`;
    const text =
      `Maker,Part No.,Description,Kind,Standard designation,Fit\r\nCorvane ` +
      `Tractor Works,${number},Governor weight ` +
      `bearing,bearing,6200-2RS,direct\r\n`;
    const response = await upload(admin, Buffer.from(text), "cut-off.csv");
    const id = response.body.id;
    await settled(admin, id);
    // As a dead server leaves it: claimed for committing a minute ago, and no transaction holding the commit's lock.
    await sequelize.query(
      "UPDATE imports SET status = 'committing', updated_at = now() - interval '1 minute' WHERE id = :id",
      { replacements: { id } },
    );
    // While a commit's transaction is alive (here, this test holds its lock) the import is left committing.
    await sequelize.transaction(async (transaction) => {
      await sequelize.query("SELECT pg_advisory_xact_lock(1651, :id)", { replacements: { id }, transaction });
      expect((await send("get", `/api/imports/${id}`, undefined, { cookie: admin })).body.status).toBe("committing");
    });
    const after = (await send("get", `/api/imports/${id}`, undefined, { cookie: admin })).body;
    expect(after.status).toBe("parsed");
    expect(after.errorMessage).toMatch(/interrupted/);
    expect((await send("post", `/api/imports/${id}/commit`, {}, { cookie: admin })).status).toBe(202);
    expect((await settled(admin, id)).status).toBe("committed");
    expect(await OriginalPart.findOne({ where: { number } })).not.toBeNull();
    expect((await send("post", `/api/imports/${id}/rollback`, {}, { cookie: admin })).status).toBe(200);
  });
});

describe("large bodies", () => {
  it("refuses a large body on every route but the import upload, before reading it", async () => {
    // 200 KB of JSON to routes that take a few hundred bytes, signed in and not.
    const big = { title: "x".repeat(200 * 1024) };
    expect((await send("post", "/api/lists", big, { cookie: admin })).status).toBe(413);
    expect(
      (await send("post", "/api/auth/sign-in", { email: "a@example.org", password: "x".repeat(200 * 1024) })).status,
    ).toBe(413);
  });

  it("takes a large CSV on the import upload, which makes the origin check itself", async () => {
    // About 600 KB: the sample's rows repeated, well above what any other route takes.
    const header = SAMPLE.toString("utf8").split(/\r?\n/)[0];
    const rows = Array.from(
      { length: 6000 },
      (_, i) => `Pellworth & Sons,${9000 + i}.M1,Test row ${i},bearing,6201-2RS,direct`,
    );
    const bytes = Buffer.from([header, ...rows].join("\r\n"));
    expect(bytes.length).toBeGreaterThan(200 * 1024);
    const response = await upload(admin, bytes, "big.csv");
    expect(response.status).toBe(202);

    const foreign = await request(APP_URL)
      .post("/api/imports")
      .set("Origin", "http://elsewhere.example")
      .set("Cookie", admin)
      .attach("file", Buffer.from("a,b\r\n1,2\r\n"), { filename: "x.csv", contentType: "text/csv" });
    expect(foreign.status).toBe(403);
    expect(foreign.body.error).toBe("forbidden_origin");
  });
});

describe("files that are not CSV text", () => {
  it("refuses a binary file and a UTF-16 file with 400 on the file field, naming the reason", async () => {
    const png = Buffer.from([
      0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52, 0x00, 0x01, 0x00,
      0x00,
    ]);
    const binary = await upload(admin, png, "photo.csv");
    expect(binary.status).toBe(400);
    expect(binary.body.field).toBe("file");

    const utf16 = Buffer.concat([
      Buffer.from([0xff, 0xfe]),
      Buffer.from("Maker,Part No.,Description\r\nCorvane Tractor Works,CV-1,Test\r\n", "utf16le"),
    ]);
    const wide = await upload(admin, utf16, "wide.csv");
    expect(wide.status).toBe(400);
    expect(wide.body.field).toBe("file");
    expect(wide.body.message).toMatch(/UTF-16/);

    const nul = await upload(admin, Buffer.from("Maker,Part No.\r\nCorvane Tractor Works,CV-\u00001\r\n"), "nul.csv");
    expect(nul.status).toBe(400);
    expect(nul.body.field).toBe("file");
  });
});
