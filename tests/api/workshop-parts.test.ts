import { randomUUID } from "node:crypto";
import Papa from "papaparse";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { OriginalPart, sequelize, StandardPart } from "@/db";
import { APP_URL, send, signIn } from "../helpers/api";
import { settled, upload } from "../helpers/imports";
import { proposeNewStandard } from "../helpers/proposals";

afterAll(() => sequelize.close());

const get = (path: string) => send("get", path);
const ROUND = "unit=mm&outline=circle&od=120&bore=60&holes=4&pcd=100&hole=10&use=water";

let member: string;
let moderator: string;
let admin: string;

beforeAll(async () => {
  [member, moderator, admin] = await Promise.all([
    signIn("club.member5@understudy.test"),
    signIn("moderator@understudy.test"),
    signIn("admin@understudy.test"),
  ]);
});

describe("the workshop calculators' API", () => {
  it("sizes a felt ring and its strip, in the unit measured in", async () => {
    const { status, body } = await get("/api/felts/size?shaft=1.247&bore=1.75&width=0.25&unit=in");
    expect(status).toBe(200);
    // Geometry: the strip is cut to π × the groove's mean diameter, π × (1.247 + 1.750) / 2 = 4.708 in.
    expect(body).toMatchObject({
      unit: "in",
      ring: { inside: 1.25, outside: 1.75, thickness: 0.25 },
      strip: { width: 0.25, thickness: 0.25, cutLength: 4.708 },
      label: "Felt ring 1-1/4 × 1-3/4 × 1/4 in",
    });
    expect(body.notes.join(" ")).toMatch(/[Ss]oak/);
    expect(Array.isArray(body.catalogueParts)).toBe(true);
  });

  it("sizes gland packing: section, cut length, rings", async () => {
    const { body } = await get("/api/packing/size?shaft=5/8&bore=1-1/8&depth=1&unit=in");
    // Geometry: (1.125 − 0.625) / 2 = 1/4 in; common practice (no published source): π × (0.625 + 0.25) = 2.749 in.
    expect(body).toMatchObject({ section: 0.25, sectionLabel: "1/4 in square", cutLength: 2.749, rings: 4 });
    // The demo's inch water pumps are packed with 1/4 in packing round a 5/8 in shaft.
    expect(body.catalogueParts.length).toBeGreaterThan(0);
    expect(body.catalogueParts[0].description).toBe("Water pump gland packing");
  });

  it("names the cup plug for a bore, with the inch and metric near miss", async () => {
    const { body } = await get("/api/plugs/match?bore=1.503&unit=in&kind=cup");
    expect(body.candidates[0]).toMatchObject({ label: "Cup plug 1-1/2 in", system: "inch" });
    expect(body.nearMiss).toMatchObject({ inchLabel: "1-1/2 in", metricLabel: "38 mm" });
    expect(body.source).toMatch(/DIN 443/);
  });

  it("draws a gasket template as SVG whose size is in millimetres", async () => {
    const response = await request(APP_URL).get(`/api/gaskets/template.svg?${ROUND}`).buffer(true);
    expect(response.status).toBe(200);
    expect(response.headers["content-type"]).toContain("image/svg+xml");
    const svg = response.body.toString();
    expect(svg).toMatch(/<svg [^>]*width="120mm" height="120mm"/);
    expect(svg).toContain("<title>Gasket Ø120 mm, bore Ø60, 4 holes Ø10 on Ø100, 0.8 mm fibre</title>");
  });

  it("answers 400 with the field and the reason, never a 500", async () => {
    const cases: Array<[string, string]> = [
      ["/api/felts/size?shaft=30&bore=20&width=5", "bore"],
      ["/api/felts/size?shaft=30&bore=40", "width"],
      ["/api/felts/size?shaft=abc&bore=40&width=5", "shaft"],
      ["/api/packing/size?shaft=20&bore=32&depth=1", "depth"],
      ["/api/packing/size?shaft=20&bore=18", "bore"],
      ["/api/plugs/match?bore=2&unit=mm", "bore"],
      ["/api/plugs/match?bore=40&kind=round", "kind"],
      [`/api/gaskets/template.svg?${ROUND.replace("pcd=100", "pcd=118")}`, "pcd"],
      ["/api/gaskets/template.svg?outline=star&od=10", "outline"],
      ["/api/gaskets/template.svg?outline=polygon&points=0,0;10,10;10,0;0,10", "points"],
      ["/api/gaskets/template.svg?outline=circle&od=100&holes=4&pcd=80", "hole"],
    ];
    for (const [path, field] of cases) {
      const { status, body } = await get(path);
      expect([path, status, body.field]).toEqual([path, 400, field]);
      expect(body.message.length).toBeGreaterThan(10);
    }
  });
});

describe("felt, packing, plugs and gaskets through the catalogue", () => {
  it("takes a gasket proposal with its template, and shows the template on the part once approved", async () => {
    const { number, response: created } = await proposeNewStandard(member, {
      category: "gasket",
      kind: "gasket",
      designation: "",
      template: `${APP_URL}/measure/gasket?${ROUND}`,
      description: "Governor housing gasket",
    });
    expect(created.status).toBe(201);
    expect(created.body.checks[0]).toMatchObject({ level: "ok", field: "standard.template" });
    const id = created.body.proposal.id;
    expect(
      (await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator })).status,
    ).toBe(200);
    const part = await OriginalPart.findOne({ where: { number } });
    const { body } = await get(`/api/parts/${part!.id}`);
    expect(body.crosses[0].standard).toMatchObject({
      kind: "gasket",
      designation: "Gasket Ø120 mm, bore Ø60, 4 holes Ø10 on Ø100, 0.8 mm fibre",
      outerMm: 120,
      attributes: { template: ROUND },
    });
  });

  it("proposes felt, packing and plugs by designation, read by the engine", async () => {
    for (const [kind, designation, expected] of [
      ["felt", "Felt ring 32 × 44 × 6 mm", { innerMm: 32, outerMm: 44, widthMm: 6 }],
      ["packing", "Gland packing 1/4 in square", { widthMm: 6.35 }],
      ["plug", "Cup plug 1-1/2 in", { outerMm: 38.1 }],
    ] as const) {
      const category = kind === "felt" ? "felt_seal" : kind;
      const { response: created } = await proposeNewStandard(member, { category, kind, designation });
      expect(created.status, kind).toBe(201);
      expect(created.body.checks[0].level, kind).toBe("ok");
      const id = created.body.proposal.id;
      const view = await send("get", `/api/proposals/${id}`, undefined, { cookie: moderator });
      expect(view.body.standardPart, kind).toMatchObject(expected);
    }
  });

  it("imports every kind from a spreadsheet, and rejects a gasket template that cannot be drawn", async () => {
    const tag = randomUUID().slice(0, 6).toUpperCase();
    const rows = [
      [
        "Maker",
        "Part No.",
        "Description",
        "Kind",
        "Bore (mm)",
        "OD (mm)",
        "Width (mm)",
        "Standard designation",
        "Gasket template",
        "Fit",
      ],
      [
        "Corvane Tractor Works",
        `PK-${tag}`,
        "Water pump gland packing",
        "gland packing",
        "15.875",
        "28.575",
        "",
        "Gland packing 1/4 in square",
        "",
        "direct",
      ],
      [
        "Corvane Tractor Works",
        `FR-${tag}`,
        "Fan hub felt",
        "felt",
        "32",
        "44",
        "6",
        "Felt ring 32 × 44 × 6 mm",
        "",
        "direct",
      ],
      [
        "Corvane Tractor Works",
        `CP-${tag}`,
        "Water jacket core plug",
        "core plug",
        "",
        "38.1",
        "",
        "Cup plug 1-1/2 in",
        "",
        "direct",
      ],
      [
        "Corvane Tractor Works",
        `GK-${tag}`,
        "Water pump body gasket",
        "gasket",
        "",
        "",
        "",
        "Pump body gasket, round",
        "unit=mm&outline=circle&od=96&bore=38&holes=4&pcd=80&hole=8.5",
        "direct",
      ],
      [
        "Corvane Tractor Works",
        `GX-${tag}`,
        "Water pump body gasket",
        "gasket",
        "",
        "",
        "",
        "Pump gasket too small",
        "unit=mm&outline=circle&od=50&holes=4&pcd=60&hole=5",
        "direct",
      ],
    ];
    const csv = Papa.unparse(rows);
    const uploaded = await upload(admin, Buffer.from(csv), "workshop.csv");
    expect(uploaded.status).toBe(202);
    const id = uploaded.body.id;
    const parsed = await settled(admin, id);
    expect(parsed.mapping).toMatchObject({ template: "Gasket template" });
    expect(parsed.counts).toMatchObject({ rows: 5, newParts: 4, rejected: 1 });
    expect(parsed.rejections).toEqual([expect.objectContaining({ line: 6, column: "Gasket template" })]);
    expect((await send("post", `/api/imports/${id}/commit`, {}, { cookie: admin })).status).toBe(202);
    expect((await settled(admin, id)).status).toBe("committed");

    const kindOf = async (number: string) => {
      const [[row]] = (await sequelize.query(
        `SELECT p.category, s.kind, s.designation, s.attributes FROM original_parts p
         JOIN crosses c ON c.original_part_id = p.id JOIN standard_parts s ON s.id = c.standard_part_id
         WHERE p.number = :number`,
        { replacements: { number } },
      )) as [
        Array<{ category: string; kind: string; designation: string; attributes: Record<string, unknown> }>,
        unknown,
      ];
      return row;
    };
    expect(await kindOf(`PK-${tag}`)).toMatchObject({ category: "packing", kind: "packing" });
    expect(await kindOf(`FR-${tag}`)).toMatchObject({ category: "felt_seal", kind: "felt" });
    expect(await kindOf(`CP-${tag}`)).toMatchObject({ category: "plug", kind: "plug" });
    expect(await kindOf(`GK-${tag}`)).toMatchObject({
      category: "gasket",
      kind: "gasket",
      attributes: { template: "unit=mm&outline=circle&od=96&bore=38&holes=4&pcd=80&hole=8.5&use=water" },
    });
    expect(await StandardPart.count({ where: { kind: "gasket" } })).toBeGreaterThan(0);
  });
});

describe("job lists", () => {
  it("keep a gasket's template on its line, and export the gasket by its description", async () => {
    const list = await send("post", "/api/lists", { title: "Pump gaskets" }, { cookie: member });
    const id = list.body.id;
    const gasket = { kind: "gasket", designation: "Gasket Ø120 mm, bore Ø60", template: ROUND };
    const added = await send("post", `/api/lists/${id}/lines`, { standard: gasket, quantity: 2 }, { cookie: member });
    expect(added.status).toBe(201);
    for (const [kind, designation] of [
      ["felt", "Felt ring 32 × 44 × 6 mm"],
      ["packing", "Gland packing 1/4 in square"],
      ["plug", "Cup plug 1-1/2 in"],
    ])
      expect(
        (await send("post", `/api/lists/${id}/lines`, { standard: { kind, designation } }, { cookie: member })).status,
      ).toBe(201);
    const { body } = await send("get", `/api/lists/${id}`, undefined, { cookie: member });
    // Each kind brings its caution: old gaskets (asbestos), a running gland, drivers and hammers, fitting seals.
    expect(body.cautions).toEqual(expect.arrayContaining(["gaskets", "glands", "drivers", "seals"]));
    const line = body.lines.find((l: { category: string }) => l.category === "gasket");
    expect(line).toMatchObject({ quantity: 2, measured: { kind: "gasket", template: ROUND } });
    expect(line.chosen.outerMm).toBe(120);
    expect(body.lines.map((l: { category: string }) => l.category).sort()).toEqual([
      "felt_seal",
      "gasket",
      "packing",
      "plug",
    ]);

    const bad = await send(
      "post",
      `/api/lists/${id}/lines`,
      { standard: { ...gasket, template: "unit=mm&outline=circle&od=50&holes=4&pcd=60&hole=5" } },
      { cookie: member },
    );
    expect([bad.status, bad.body.field]).toEqual([400, "standard.template"]);

    const csv = await send("get", `/api/lists/${id}/export.csv`, undefined, { cookie: member });
    const rows = Papa.parse<Record<string, string>>(csv.text.replace(/^\uFEFF/, "").trim(), { header: true }).data;
    expect(rows.map((r) => r["Standard designation"]).sort()).toEqual([
      "Cup plug 1-1/2 in",
      "Felt ring 32 × 44 × 6 mm",
      "Gasket Ø120 mm, bore Ø60",
      "Gland packing 1/4 in square",
    ]);
  });
});
