import { randomUUID } from "node:crypto";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sequelize } from "@/db";
import { send, signIn } from "../helpers/api";
import { settled, upload } from "../helpers/imports";
import { proposeNewStandard } from "../helpers/proposals";

afterAll(() => sequelize.close());

const get = (path: string) => send("get", path);

let member: string;
let moderator: string;
let admin: string;

beforeAll(async () => {
  [member, moderator, admin] = await Promise.all([
    signIn("club.member2@understudy.test"),
    signIn("moderator@understudy.test"),
    signIn("admin@understudy.test"),
  ]);
});

describe("keys", () => {
  it("decodes a Woodruff number and matches a measured key", async () => {
    // ASME B17.2: No. 606 is 6/32 = 3/16 in wide, 6/8 = 3/4 in across.
    const { status, body } = await get("/api/keys/woodruff?number=606");
    expect(status).toBe(200);
    expect(body).toMatchObject({ number: "606", width: 0.1875, diameter: 0.75, height: 0.313, unit: "in" });
    expect(body.source).toMatch(/ASME B17.2/);
    const match = await get("/api/keys/woodruff/match?width=0.185&diameter=0.74&unit=in");
    expect(match.body.candidates[0]).toMatchObject({ number: "606" });
  });

  it("gives the parallel key for a shaft in both systems", async () => {
    // ASME B17.1: over 1-3/8 to 1-3/4 in, a 3/8 in key; DIN 6885-1: over 22 to 30 mm, 8 × 7.
    const inch = await get("/api/keys/parallel?shaft=1-1/2&unit=in");
    expect(inch.body.inch).toMatchObject({ label: "Square key 3/8 × 3/8 in" });
    const metric = await get("/api/keys/parallel?shaft=25&unit=mm");
    expect(metric.body.metric).toMatchObject({ label: "Parallel key DIN 6885 A 8 × 7" });
  });
});

describe("pins", () => {
  it("decodes a taper pin with its small end for a length, and matches a large end", async () => {
    // 1/4 in per foot on the diameter: No. 4 (0.250 in), 2 in long, is 0.250 − 2/48 = 0.2083 in at the small end.
    const { body } = await get("/api/pins/taper?number=4&length=2&unit=in");
    expect(body).toMatchObject({ number: "No. 4", largeEnd: 0.25, smallEnd: 0.2083 });
    const match = await get("/api/pins/taper/match?largeEnd=0.249&unit=in");
    expect(match.body.candidates[0]).toMatchObject({ number: "No. 4" });
    // ISO 2339, 1:50: an 8 mm pin 40 mm long is 8.8 mm at the large end.
    const metric = await get("/api/pins/taper/match?largeEnd=8.79&length=40&unit=mm");
    expect(metric.body.candidates[0]).toMatchObject({ number: "ISO 2339 8" });
  });
});

describe("threads", () => {
  it("identifies a thread from diameter and threads per inch, with the look-alike and the grease fitting", async () => {
    const { status, body } = await get("/api/threads/identify?diameter=0.247&tpi=28&unit=in");
    expect(status).toBe(200);
    expect(body.candidates[0]).toMatchObject({
      designation: "1/4-28 UNF",
      series: "UNF",
      tpi: 28,
      greaseFitting: "1/4-28 taper (SAE-LT)",
    });
    expect(body.candidates[0].warnings.join(" ")).toMatch(/M6 × 1/);
    const metric = await get("/api/threads/identify?diameter=7.9&pitch=1.25&unit=mm");
    expect(metric.body.candidates[0]).toMatchObject({ designation: "M8 × 1.25", tpi: null });
    const fittings = await get("/api/threads/grease-fittings");
    expect(fittings.body.threads.map((t: { thread: string }) => t.thread)).toEqual([
      "1/4-28 taper (SAE-LT)",
      "1/8-27 NPT",
      "M6 × 1",
      "M8 × 1",
      "M10 × 1",
    ]);
  });
});

describe("roller chain", () => {
  it("decodes a number, identifies a measured chain and counts links", async () => {
    // ASME B29.1: No. 40 is 4/8 = 1/2 in pitch with a 0.312 in roller.
    const { body } = await get("/api/chain/decode?number=40");
    expect(body).toMatchObject({ number: "40-1", pitch: 0.5, rollerDiameter: 0.312, innerWidth: 0.312, unit: "in" });
    const found = await get("/api/chain/identify?pitch=12.75&roller=8.5&width=7.7&unit=mm");
    expect(found.body.candidates[0]).toMatchObject({ number: "08B-1" });
    const links = await get("/api/chain/links?number=40&teeth1=15&teeth2=30&center=20&unit=in");
    expect(links.body).toMatchObject({ links: 104 });
  });
});

describe("bad input", () => {
  it("answers 400 naming the field, never a 500", async () => {
    const cases: Array<[string, string]> = [
      ["/api/keys/woodruff?number=999", "number"],
      ["/api/keys/woodruff/match?width=abc&diameter=0.75", "width"],
      ["/api/keys/parallel?shaft=2&unit=mm", "shaft"],
      ["/api/pins/taper?number=11", "number"],
      ["/api/pins/taper/match?unit=in", "largeEnd"],
      ["/api/threads/identify?diameter=6", "tpi"],
      ["/api/threads/identify?diameter=6&tpi=20&pitch=1", "tpi"],
      ["/api/threads/identify?diameter=6&tpi=2", "tpi"],
      ["/api/threads/identify?diameter=500&pitch=1", "diameter"],
      ["/api/chain/decode?number=45", "number"],
      ["/api/chain/identify?pitch=0.5&unit=in", "roller"],
      ["/api/chain/links?number=40&teeth1=15&teeth2=30&center=1&unit=in", "center"],
      ["/api/chain/links?number=40&teeth1=x&teeth2=30&center=20", "teeth1"],
      ["/api/chain/links?teeth1=15&teeth2=30&center=20", "number"],
    ];
    for (const [path, field] of cases) {
      const { status, body } = await get(path);
      expect([path, status, body.field]).toEqual([path, 400, field]);
    }
  });
});

describe("in the catalogue", () => {
  it("proposes each kind by its designation, read by the engine", async () => {
    for (const [kind, category, designation, expected] of [
      ["key", "key", "Woodruff key No. 606 (3/16 × 3/4 in)", { widthMm: 4.763, outerMm: 19.05 }],
      ["pin", "pin", "Taper pin No. 4", { outerMm: 6.35 }],
      ["thread", "fastener", "Stud 7/16-14 UNC", { outerMm: 11.113 }],
      ["grease_fitting", "grease_fitting", "Grease fitting 1/4-28 taper, 90°", { outerMm: 6.35 }],
      ["chain", "chain", "Roller chain ANSI 40-1", { outerMm: 7.925, widthMm: 7.925 }],
    ] as const) {
      const { response: created } = await proposeNewStandard(member, { category, kind, designation });
      expect(created.status, kind).toBe(201);
      expect(created.body.checks[0].level, kind).toBe("ok");
      const view = await send("get", `/api/proposals/${created.body.proposal.id}`, undefined, { cookie: moderator });
      for (const [key, value] of Object.entries(expected))
        expect(view.body.standardPart[key], `${kind} ${key}`).toBeCloseTo(value, 2);
    }
  });

  it("imports every kind, and puts each on a job list with its caution", async () => {
    const tag = randomUUID().slice(0, 6).toUpperCase();
    const csv = Papa.unparse([
      ["Maker", "Part No.", "Description", "Kind", "Standard designation", "Fit"],
      ["Corvane Tractor Works", `TP-${tag}`, "Fan hub taper pin", "taper pin", "Taper pin No. 5", "direct"],
      [
        "Corvane Tractor Works",
        `GF-${tag}`,
        "Fan hub grease fitting",
        "grease fitting",
        "Grease fitting 1/8-27 NPT",
        "direct",
      ],
      ["Corvane Tractor Works", `CH-${tag}`, "Magneto drive chain", "roller chain", "Roller chain ANSI 35-1", "direct"],
      ["Corvane Tractor Works", `ST-${tag}`, "Head stud", "stud", "Stud 1/2 BSW", "direct"],
      ["Corvane Tractor Works", `XX-${tag}`, "Head stud", "stud", "Stud 1/2-99 UNC", "direct"],
    ]);
    const uploaded = await upload(admin, Buffer.from(csv), "small-parts.csv");
    const parsed = await settled(admin, uploaded.body.id);
    // The unreadable thread is kept with the engine's warning, as for any designation it cannot read.
    expect(parsed.counts).toMatchObject({ rows: 5, newParts: 5, rejected: 0 });
    await send("post", `/api/imports/${uploaded.body.id}/commit`, {}, { cookie: admin });
    expect((await settled(admin, uploaded.body.id)).status).toBe("committed");
    const [rows] = (await sequelize.query(
      `SELECT p.number, p.category, s.kind FROM original_parts p JOIN crosses c ON c.original_part_id = p.id
       JOIN standard_parts s ON s.id = c.standard_part_id WHERE p.number LIKE :tag ORDER BY p.number`,
      { replacements: { tag: `%-${tag}` } },
    )) as [Array<{ number: string; category: string; kind: string }>, unknown];
    expect(rows.map((r) => [r.number.slice(0, 2), r.category, r.kind])).toEqual([
      ["CH", "chain", "chain"],
      ["GF", "grease_fitting", "grease_fitting"],
      ["ST", "fastener", "thread"],
      ["TP", "pin", "pin"],
      ["XX", "fastener", "thread"],
    ]);

    const list = (await send("post", "/api/lists", { title: "Fan hub and magneto" }, { cookie: member })).body.id;
    for (const [kind, designation] of [
      ["pin", "Taper pin No. 5"],
      ["grease_fitting", "Grease fitting 1/8-27 NPT"],
      ["chain", "Roller chain ANSI 35-1"],
      ["key", "Woodruff key No. 404 (1/8 × 1/2 in)"],
      ["thread", "Stud 1/2 BSW"],
    ])
      expect(
        (await send("post", `/api/lists/${list}/lines`, { standard: { kind, designation } }, { cookie: member }))
          .status,
      ).toBe(201);
    const { body } = await send("get", `/api/lists/${list}`, undefined, { cookie: member });
    expect(body.lines).toHaveLength(5);
    expect(body.cautions).toEqual(expect.arrayContaining(["drivers", "chains", "grease"]));
  });
});
