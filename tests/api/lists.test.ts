import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sequelize } from "@/db";
import { send, signIn } from "../helpers/api";

afterAll(() => sequelize.close());

let owner: string;
let other: string;

beforeAll(async () => {
  [owner, other] = await Promise.all([signIn("club.member6@understudy.test"), signIn("club.member7@understudy.test")]);
});

async function newList(title = "Water pump rebuild, customer's 1948 crawler") {
  const response = await send("post", "/api/lists", { title }, { cookie: owner });
  expect(response.status).toBe(201);
  return response.body.id as number;
}

describe("job lists belong to their owner", () => {
  it("refuses visitors, checks the title, and hides one member's list from another (404)", async () => {
    expect((await send("get", "/api/lists")).status).toBe(401);
    expect((await send("post", "/api/lists", { title: "" }, { cookie: owner })).body.field).toBe("title");
    const id = await newList();
    expect((await send("get", `/api/lists/${id}`, undefined, { cookie: other })).status).toBe(404);
    expect((await send("patch", `/api/lists/${id}`, { title: "Mine now" }, { cookie: other })).status).toBe(404);
    expect((await send("post", `/api/lists/${id}/lines`, { number: "CV-3003-B" }, { cookie: other })).status).toBe(404);
    expect((await send("delete", `/api/lists/${id}`, undefined, { cookie: other })).status).toBe(404);
    const renamed = await send(
      "patch",
      `/api/lists/${id}`,
      { title: "Fan hub and water pump", notes: "Customer brings the pulley." },
      { cookie: owner },
    );
    expect(renamed.status).toBe(200);
    expect(renamed.body).toMatchObject({
      title: "Fan hub and water pump",
      notes: "Customer brings the pulley.",
      machine: null,
    });
    expect((await send("patch", `/api/lists/${id}`, { machineId: 999999 }, { cookie: owner })).body.field).toBe(
      "machineId",
    );
    const mine = await send("get", "/api/lists", undefined, { cookie: owner });
    expect(mine.body.lists.map((l: { id: number }) => l.id)).toContain(id);
    expect(
      (await send("get", "/api/lists", undefined, { cookie: other })).body.lists.map((l: { id: number }) => l.id),
    ).not.toContain(id);
  });

  it("adds a typed number as its latest number with the best equivalent, and merges a repeat", async () => {
    const id = await newList();
    // CV-3003-A is superseded by CV-3003-B in the demo catalogue.
    const added = await send("post", `/api/lists/${id}/lines`, { number: "cv 3003a", quantity: 2 }, { cookie: owner });
    expect(added.status).toBe(201);
    expect(added.body).toMatchObject({ superseded: true, read: "CV-3003-A", latestNumber: "CV-3003-B" });
    const again = await send("post", `/api/lists/${id}/lines`, { number: "CV-3003-B" }, { cookie: owner });
    expect(again.status).toBe(200);
    const { body } = await send("get", `/api/lists/${id}`, undefined, { cookie: owner });
    expect(body.lines).toHaveLength(1);
    // The shared ranking counts CV-3003-A's crosses for CV-3003-B (interchangeable): 6203-2RS C3, five members.
    expect(body.lines[0]).toMatchObject({
      number: "CV-3003-B",
      earlierNumbers: ["CV-3003-A"],
      quantity: 3,
      chosen: expect.objectContaining({ designation: "6203-2RS C3", fit: "direct", viaNumber: "CV-3003-A" }),
    });
    expect(body.lines[0]).not.toHaveProperty("requestedNumber");
    expect(body.totals).toEqual([{ category: "bearing", name: "Ball bearing", lines: 1, quantity: 3 }]);

    const unknown = await send("post", `/api/lists/${id}/lines`, { number: "ZZ-0000-Q" }, { cookie: owner });
    expect(unknown.status).toBe(400);
    expect(unknown.body.field).toBe("number");
  });

  it("edits a line's quantity and equivalent within the rules, and removes it", async () => {
    const id = await newList();
    const { body: added } = await send("post", `/api/lists/${id}/lines`, { number: "HM 210 007" }, { cookie: owner });
    const url = `/api/lists/${id}/lines/${added.lineId}`;
    expect((await send("patch", url, { quantity: 0 }, { cookie: owner })).body.field).toBe("quantity");
    expect((await send("patch", url, { standardPartId: 1 }, { cookie: owner })).status).toBe(400);
    const list = (await send("get", `/api/lists/${id}`, undefined, { cookie: owner })).body;
    const shielded = list.lines[0].equivalents.find((e: { designation: string }) => e.designation === "6203-2Z");
    expect(
      (
        await send(
          "patch",
          url,
          { quantity: 4, standardPartId: shielded.standardPartId, notes: "customer supplies the slinger" },
          { cookie: owner },
        )
      ).status,
    ).toBe(200);
    const after = (await send("get", `/api/lists/${id}`, undefined, { cookie: owner })).body;
    expect(after.lines[0]).toMatchObject({
      quantity: 4,
      notes: "customer supplies the slinger",
      chosen: { designation: "6203-2Z", fit: "with_modification" },
    });
    expect(after.lines[0].warnings[0]).toBe(
      "HM 210 007 → 6203-2Z: fits with modification. Read the notes on the part's page before ordering.",
    );
    const removed = await send("delete", url, undefined, { cookie: owner });
    expect(removed.status).toBe(200);
    expect(removed.body.undoSeconds).toBeGreaterThan(5);
    expect((await send("get", `/api/lists/${id}`, undefined, { cookie: owner })).body.lines).toEqual([]);
    // Undo puts the line back as it was; a second undo has nothing to do.
    expect((await send("post", `${url}/restore`, {}, { cookie: other })).status).toBe(404);
    expect((await send("post", `${url}/restore`, {}, { cookie: owner })).status).toBe(200);
    expect((await send("get", `/api/lists/${id}`, undefined, { cookie: owner })).body.lines[0]).toMatchObject({
      id: added.lineId,
      quantity: 4,
      notes: "customer supplies the slinger",
    });
    expect((await send("post", `${url}/restore`, {}, { cookie: owner })).status).toBe(404);
  });

  it("keeps a shop's supplier, supplier's number, unit price and ordered mark on a line", async () => {
    const id = await newList();
    const { body: added } = await send("post", `/api/lists/${id}/lines`, { number: "HM 210 007" }, { cookie: owner });
    const url = `/api/lists/${id}/lines/${added.lineId}`;
    expect((await send("patch", url, { unitPrice: "-1" }, { cookie: owner })).body.field).toBe("unitPrice");
    expect((await send("patch", url, { unitPrice: "4.555" }, { cookie: owner })).body.field).toBe("unitPrice");
    expect((await send("patch", url, { ordered: "yes" }, { cookie: owner })).body.field).toBe("ordered");
    expect((await send("patch", url, { supplier: "x".repeat(121) }, { cookie: owner })).body.field).toBe("supplier");
    expect(
      (
        await send(
          "patch",
          url,
          { supplier: "County Bearings", supplierNumber: "CB-17-40", unitPrice: "6,40", ordered: true },
          { cookie: owner },
        )
      ).status,
    ).toBe(200);
    const { body } = await send("get", `/api/lists/${id}`, undefined, { cookie: owner });
    expect(body.lines[0]).toMatchObject({
      supplier: "County Bearings",
      supplierNumber: "CB-17-40",
      unitPrice: "6.40",
      ordered: true,
    });
    expect((await send("patch", url, { unitPrice: "", supplier: "" }, { cookie: owner })).status).toBe(200);
    expect((await send("get", `/api/lists/${id}`, undefined, { cookie: owner })).body.lines[0]).toMatchObject({
      supplier: null,
      unitPrice: null,
      ordered: true,
    });
  });

  it(
    "adds a number with one misread character, saying what it read, and " + "offers several matches as choices",
    async () => {
      const id = await newList();
      // O for 0 on a worn stamping: one part has that number once the look-alikes are folded.
      const misread = await send("post", `/api/lists/${id}/lines`, { number: "HM 21O OO7" }, { cookie: owner });
      expect(misread.status).toBe(201);
      expect(misread.body.read).toBe("HM 210 007");
      // A number that is only similar to real ones is not guessed: the nearest come back as choices.
      const near = await send("post", `/api/lists/${id}/lines`, { number: "CV-3003-Q" }, { cookie: owner });
      expect(near.status).toBe(400);
      expect(near.body.field).toBe("number");
      expect(near.body.choices.map((c: { number: string }) => c.number)).toContain("CV-3003-A");
      expect(near.body.choices[0]).toEqual({
        partId: expect.any(Number),
        number: expect.any(String),
        maker: expect.any(String),
        description: expect.any(String),
      });
    },
  );

  it("adds the rest of a part's assembly in one step, one part for each position", async () => {
    const id = await newList();
    const { body: added } = await send("post", `/api/lists/${id}/lines`, { number: "HM 210 007" }, { cookie: owner });
    // The list names no machine serial; where the pump's parts changed with the serial, it asks which range.
    const asked = await send("post", `/api/lists/${id}/lines/${added.lineId}/assembly`, {}, { cookie: owner });
    expect(asked.status).toBe(400);
    expect(asked.body.field).toBe("serial");
    const rest = await send(
      "post",
      `/api/lists/${id}/lines/${added.lineId}/assembly`,
      { serial: asked.body.choices[0].serial },
      { cookie: owner },
    );
    expect(rest.status).toBe(200);
    expect(rest.body.added).toBeGreaterThan(0);
    expect(rest.body.assembly).toBe("Water pump");
    const list = (await send("get", `/api/lists/${id}`, undefined, { cookie: owner })).body;
    expect(list.lines).toHaveLength(1 + rest.body.added);
    expect(new Set(list.lines.map((l: { description: string }) => l.description)).size).toBe(list.lines.length);
    expect(
      (await send("post", `/api/lists/${id}/lines/${added.lineId}/assembly`, {}, { cookie: owner })).body.added,
    ).toBe(0);
  });

  it("merges the same part added twice at the same moment (a double click) into one line", async () => {
    const id = await newList();
    const adds = await Promise.all(
      [1, 2, 3].map(() => send("post", `/api/lists/${id}/lines`, { number: "CV-3003-B" }, { cookie: owner })),
    );
    expect(adds.map((a) => a.status).sort()).toEqual([200, 200, 201]);
    const list = (await send("get", `/api/lists/${id}`, undefined, { cookie: owner })).body;
    expect(list.lines).toEqual([expect.objectContaining({ number: "CV-3003-B", quantity: 3 })]);
  });
});

describe("export and sharing", () => {
  it("exports CSV that reads back through papaparse line for line", async () => {
    const id = await newList("Export check");
    await send(
      "post",
      `/api/lists/${id}/lines`,
      { number: "CV-3003-B", quantity: 2, notes: 'front, "sealed" please' },
      { cookie: owner },
    );
    await send("post", `/api/lists/${id}/lines`, { number: "CV-3008-A" }, { cookie: owner });
    const response = await send("get", `/api/lists/${id}/export.csv`, undefined, { cookie: owner });
    expect(response.status).toBe(200);
    expect(response.headers["content-disposition"]).toContain("export-check.csv");
    const parsed = Papa.parse<Record<string, string>>(response.text.replace(/^\uFEFF/, ""), {
      header: true,
      skipEmptyLines: true,
    });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([
      "List",
      "Machine",
      "Serial",
      "Factory number",
      "Earlier numbers",
      "Maker",
      "Description",
      "Standard designation",
      "Kind of part",
      "Sizes",
      "Fit",
      "Quantity",
      "Supplier",
      "Supplier's number",
      "Unit price",
      "Ordered",
      "Notes",
    ]);
    // ISO 15:2017, deep groove ball bearings, series 62: 6203 is 17 × 40 × 12 mm.
    expect(parsed.data).toEqual([
      expect.objectContaining({
        List: "Export check",
        "Factory number": "CV-3003-B",
        "Earlier numbers": "CV-3003-A",
        "Standard designation": "6203-2RS C3",
        "Kind of part": "Ball bearing",
        Sizes: "17 × 40 × 12 mm",
        Fit: "Direct",
        Quantity: "2",
        Notes: 'front, "sealed" please',
      }),
      expect.objectContaining({
        "Factory number": "CV-3008-A",
        "Earlier numbers": "",
        "Standard designation": "32 × 47 × 8 mm, spring-loaded lip, rubber OD",
        Sizes: "32 × 47 × 8 mm",
        Quantity: "1",
        Notes: "",
      }),
    ]);
    expect((await send("get", `/api/lists/${id}/export.csv`, undefined, { cookie: other })).status).toBe(404);
  });

  it("shares a read-only link, and stops when sharing is turned off", async () => {
    const id = await newList("Shared with the customer");
    await send("post", `/api/lists/${id}/lines`, { number: "CV-3003-B" }, { cookie: owner });
    const shared = await send("post", `/api/lists/${id}/share`, { enabled: true }, { cookie: owner });
    const token = shared.body.token as string;
    expect(shared.body.url).toContain(`token=${token}`);

    const read = await send("get", `/api/lists/${id}?token=${token}`);
    expect(read.status).toBe(200);
    expect(read.body).toMatchObject({ readOnly: true, shareToken: null, title: "Shared with the customer" });
    expect((await send("get", `/api/lists/${id}/export.csv?token=${token}`)).status).toBe(200);
    expect((await send("patch", `/api/lists/${id}?token=${token}`, { title: "Changed" })).status).toBe(401);
    expect(
      (await send("post", `/api/lists/${id}/lines?token=${token}`, { number: "HM 210 007" }, { cookie: other })).status,
    ).toBe(404);
    expect((await send("get", `/api/lists/${id}?token=${token.slice(0, -2)}xx`)).status).toBe(404);

    await send("post", `/api/lists/${id}/share`, { enabled: false }, { cookie: owner });
    expect((await send("get", `/api/lists/${id}?token=${token}`)).status).toBe(404);
  });
});

describe("the demo job list", () => {
  it("gives the demo member a water pump rebuild on a crawler, the whole pump on it", async () => {
    const member = await signIn("member@understudy.test");
    const { body } = await send("get", "/api/lists", undefined, { cookie: member });
    const demo = body.lists.find((l: { title: string }) => l.title.startsWith("Water pump rebuild"));
    expect(demo).toMatchObject({ machine: expect.stringContaining("Crawler"), shared: false });
    const list = (await send("get", `/api/lists/${demo.id}`, undefined, { cookie: member })).body;
    expect(list.lines.length).toBeGreaterThan(2);
    expect(list.lines.every((l: { description: string }) => /pump|impeller/i.test(l.description))).toBe(true);
  });
});

describe("POST /api/lists/{id}/lines with a standard part from a calculator", () => {
  it("adds the seal to order by its sizes, merges a repeat, and exports it without a factory number", async () => {
    const id = await newList("Fan hub reseal");
    const seal = { kind: "lip_seal", designation: "1-1/2 × 2.374 × 1/2 in", note: "seal OD 2.376 in to 2.380 in" };
    const added = await send("post", `/api/lists/${id}/lines`, { standard: seal, quantity: 1 }, { cookie: owner });
    expect(added.status).toBe(201);
    const again = await send("post", `/api/lists/${id}/lines`, { standard: seal, quantity: 1 }, { cookie: owner });
    expect(again.status).toBe(200);
    expect(again.body.merged).toBe(true);

    const { body } = await send("get", `/api/lists/${id}`, undefined, { cookie: owner });
    expect(body.lines).toHaveLength(1);
    expect(body.lines[0]).toMatchObject({
      partId: null,
      quantity: 2,
      category: "lip_seal",
      description: "seal OD 2.376 in to 2.380 in",
      hasAssembly: false,
    });
    // 1-1/2 in = 38.1 mm and 2.374 in = 60.2996 mm (25.4 mm/in).
    expect(body.lines[0].chosen.designation).toBe("1-1/2 × 2.374 × 1/2 in");
    expect(body.lines[0].chosen.innerMm).toBeCloseTo(38.1, 3);
    expect(body.lines[0].chosen.outerMm).toBeCloseTo(60.2996, 3);

    const csv = await send("get", `/api/lists/${id}/export.csv`, undefined, { cookie: owner });
    const [row] = Papa.parse<Record<string, string>>(csv.text.replace(/^\uFEFF/, "").trim(), { header: true }).data;
    expect(row).toMatchObject({
      "Factory number": "",
      Maker: "",
      "Standard designation": "1-1/2 × 2.374 × 1/2 in",
      Fit: "sized from measurements",
    });
  });

  it("refuses a line that names no part, or two at once, with the field", async () => {
    const id = await newList();
    const none = await send("post", `/api/lists/${id}/lines`, { quantity: 1 }, { cookie: owner });
    expect(none.status).toBe(400);
    expect(none.body.field).toBe("number");
    const both = await send(
      "post",
      `/api/lists/${id}/lines`,
      { number: "CV-3003-B", standard: { kind: "bearing", designation: "6203" } },
      { cookie: owner },
    );
    expect(both.status).toBe(400);
    const badKind = await send(
      "post",
      `/api/lists/${id}/lines`,
      { standard: { kind: "rocket", designation: "6203" } },
      { cookie: owner },
    );
    expect(badKind.status).toBe(400);
    expect(badKind.body.field).toBe("standard.kind");
  });
});

describe("POST /api/lists/{id}/lines under concurrency", () => {
  it("takes a burst of quick adds of one member without running out of connections", async () => {
    // More adds at once than the pool has connections: each one's transaction must not reach for a second
    // connection while it holds the list's row lock, or they wait on each other until the acquire timeout (500).
    const id = await newList("Twelve quick adds");
    const numbers = ["CV-3003-B", "HM 210 007", "cv 3003a", "CV-3009-A", "CV-3012-A", "CV-3015-A"];
    const responses = await Promise.all(
      Array.from({ length: 24 }, (_, i) =>
        send("post", `/api/lists/${id}/lines`, { number: numbers[i % numbers.length] }, { cookie: owner }),
      ),
    );
    expect(responses.map((r) => r.status).filter((s) => s >= 500)).toEqual([]);
    expect(responses.every((r) => r.status === 200 || r.status === 201)).toBe(true);
    const { body } = await send("get", `/api/lists/${id}`, undefined, { cookie: owner });
    expect(body.lines.reduce((sum: number, l: { quantity: number }) => sum + l.quantity, 0)).toBe(24);
  });
});
