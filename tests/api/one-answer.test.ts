import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { Cross, Machine, Maker, OriginalPart, sequelize, StandardPart, Supersession } from "@/db";
import { getMachine } from "@/lib/catalogue/browse";
import { send, signIn } from "../helpers/api";

afterAll(() => sequelize.close());

let owner: string;
beforeAll(async () => {
  owner = await signIn("club.member5@understudy.test");
});

const partId = async (number: string) => (await OriginalPart.findOne({ where: { number } }))!.id;
const machineId = async (model: string) => (await Machine.findOne({ where: { model } }))!.id;

type Ranked = {
  id: number;
  viaNumber: string | null;
  fit: string;
  standard: { designation: string } | null;
  repairMethod: string | null;
};
const label = (c: Ranked) => c.standard?.designation ?? c.repairMethod;

async function crossesOf(id: number): Promise<Ranked[]> {
  const { status, body } = await send("get", `/api/parts/${id}`);
  expect(status).toBe(200);
  return body.crosses;
}

async function newList(body: Record<string, unknown>) {
  const response = await send("post", "/api/lists", { title: "Serial check", ...body }, { cookie: owner });
  expect(response.status).toBe(201);
  return response.body.id as number;
}

describe("one ranking of a part's crosses, along its supersession chain", () => {
  /**
   * Parts of a maker made up for this test: A is replaced one way by B, B and C are interchangeable, and D is
   * replaced by A only together with companion parts. Each has one cross of its own.
   */
  const made: Record<string, number> = {};
  beforeAll(async () => {
    const maker = await Maker.create({
      name: `Ranking Test Works ${Date.now()}`,
      prefixes: [],
      country: null,
      note: null,
    });
    const standards = await StandardPart.findAll({ where: { kind: "bearing" }, order: [["id", "ASC"]], limit: 4 });
    for (const [i, key] of ["A", "B", "C", "D"].entries()) {
      const number = `RT-${maker.id}-${key}`;
      const part = await OriginalPart.create({
        makerId: maker.id,
        number,
        numberNormalised: number.replace(/-/g, ""),
        numberKey: number.replace(/-/g, ""),
        description: "Ranking test bearing",
        category: "bearing",
        innerMm: null,
        outerMm: null,
        widthMm: null,
        lengthMm: null,
        dimensionsNote: null,
      });
      made[key] = part.id;
      await Cross.create({
        originalPartId: part.id,
        standardPartId: standards[i].id,
        repairMethod: null,
        fit: key === "C" ? "with_modification" : "direct",
        notes: null,
        status: "approved",
        origin: "editor",
      });
    }
    await Supersession.bulkCreate([
      { oldPartId: made.A, newPartId: made.B, kind: "one_way", note: null },
      { oldPartId: made.B, newPartId: made.C, kind: "interchangeable", note: null },
      { oldPartId: made.D, newPartId: made.A, kind: "with_companions", note: null },
    ]);
  });

  it(
    "gives an older number the crosses of the newer numbers that replace it " +
      "one way, marked with the number they came from",
    async () => {
      const a = await crossesOf(made.A);
      expect(a.map((c) => c.viaNumber)).toEqual([null, expect.stringMatching(/-B$/), expect.stringMatching(/-C$/)]);
    },
  );

  it("never gives a newer number the crosses of an older one across a one-way link", async () => {
    const b = await crossesOf(made.B);
    expect(b.map((c) => c.viaNumber)).toEqual([null, expect.stringMatching(/-C$/)]);
    const c = await crossesOf(made.C);
    // C's own cross fits with modification, so B's direct one (reached through the interchangeable link) comes first.
    expect(c.map((x) => [x.viaNumber, x.fit])).toEqual([
      [expect.stringMatching(/-B$/), "direct"],
      [null, "with_modification"],
    ]);
  });

  it("passes nothing across a link that needs companion parts", async () => {
    expect((await crossesOf(made.D)).map((c) => c.viaNumber)).toEqual([null]);
  });

  it("ranks CV-3003-A and its interchangeable CV-3003-B alike, the bearing five members fitted first", async () => {
    const [a, b] = await Promise.all([crossesOf(await partId("CV-3003-A")), crossesOf(await partId("CV-3003-B"))]);
    expect(label(a[0])).toBe("6203-2RS C3");
    expect(b[0]).toMatchObject({ viaNumber: "CV-3003-A", standard: { designation: "6203-2RS C3" } });
    expect(a.map(label).sort()).toEqual(b.map(label).sort());
    // One standard part reached through both numbers shows once.
    expect(new Set(b.map(label)).size).toBe(b.length);
  });

  it("gives the same best answer on the part page, in look-up, on the machine table and on a job list", async () => {
    const id = await partId("CV-3003-B");
    const best = label((await crossesOf(id))[0]);
    const lookup = (await send("get", "/api/parts/lookup?q=CV-3003-B")).body.results[0];
    expect(lookup).toMatchObject({ number: "CV-3003-B", best: { label: best, viaNumber: "CV-3003-A" } });
    const list = await newList({});
    await send("post", `/api/lists/${list}/lines`, { partId: id }, { cookie: owner });
    const view = (await send("get", `/api/lists/${list}`, undefined, { cookie: owner })).body;
    expect(view.lines[0].chosen.designation).toBe(best);
    const csv = await send("get", `/api/lists/${list}/export.csv`, undefined, { cookie: owner });
    expect(csv.text).toContain(`,${best},`);
    const machine = await getMachine(await machineId("Model 22"));
    expect(machine.parts.find((p) => p.number === "CV-3003-B")).toMatchObject({
      standard: best,
      viaNumber: "CV-3003-A",
      serials: "to serial 22-1340",
    });
  });
});

describe("serial ranges", () => {
  it("shows the serials a part was fitted to where it is used", async () => {
    const { body } = await send("get", `/api/parts/${await partId("CV-3003-A")}`);
    expect(body.whereUsed).toEqual([
      expect.objectContaining({ model: "Model 22", assembly: "Water pump", serials: "to serial 22-1340" }),
    ]);
  });

  it(
    "asks which serial range when the list has no serial, then adds one " + "part for each position of that serial",
    async () => {
      const list = await newList({ machineId: await machineId("Model 22") });
      const { body: line } = await send("post", `/api/lists/${list}/lines`, { number: "CV-3004-A" }, { cookie: owner });
      const url = `/api/lists/${list}/lines/${line.lineId}/assembly`;
      const asked = await send("post", url, {}, { cookie: owner });
      expect(asked.status).toBe(400);
      expect(asked.body.field).toBe("serial");
      expect(asked.body.choices).toContainEqual({ serial: "22-1340", label: "up to 22-1340" });
      expect(asked.body.choices).toContainEqual({ serial: "22-3205", label: "22-3205 and later" });
      expect((await send("get", `/api/lists/${list}`, undefined, { cookie: owner })).body.lines).toHaveLength(1);

      expect((await send("post", url, { serial: "30-1000" }, { cookie: owner })).body.field).toBe("serial");
      const added = await send("post", url, { serial: "22-1000" }, { cookie: owner });
      expect(added.status).toBe(200);
      expect(added.body.serial).toBe("22-1000");
      const numbers = (await send("get", `/api/lists/${list}`, undefined, { cookie: owner })).body.lines
        .map((l: { number: string }) => l.number)
        .sort();
      // Serial 22-1000 of the Model 22 water pump: the early front bearing (under its service number), the early seal
      // and key, and the parts fitted throughout, the gland packing among them.
      expect(numbers).toEqual(["CV-3003-B", "CV-3004-A", "CV-3010-A", "CV-3013-A", "CV-3016-A", "CV-3182-A"]);
    },
  );

  it(
    "gives a job list for a machine and serial exactly one part per " + "position, and skips a position already filled",
    async () => {
      const list = await newList({ machineId: await machineId("Model 22"), machineSerial: "22-3000" });
      // The front bearing of serials 22-1341 to 22-2890 is already on the list (perhaps wrongly):
      // it fills the position.
      await send("post", `/api/lists/${list}/lines`, { number: "CV-3000-A" }, { cookie: owner });
      const { body: line } = await send("post", `/api/lists/${list}/lines`, { number: "CV-3004-A" }, { cookie: owner });
      const added = await send("post", `/api/lists/${list}/lines/${line.lineId}/assembly`, {}, { cookie: owner });
      expect(added.status).toBe(200);
      expect(added.body.skipped).toContain("Water pump bearing, front");
      const view = (await send("get", `/api/lists/${list}`, undefined, { cookie: owner })).body;
      expect(view.machineSerial).toBe("22-3000");
      const positions = view.lines.map((l: { description: string }) => l.description);
      expect(new Set(positions).size).toBe(positions.length);
      expect(view.lines.map((l: { number: string }) => l.number).sort()).toEqual([
        "CV-3000-A",
        "CV-3004-A",
        "CV-3010-A",
        "CV-3013-A",
        "CV-3017-A",
        "CV-3182-A",
      ]);
      // The bearing that does not fit serial 22-3000 says so, by its number.
      const front = view.lines.find((l: { number: string }) => l.number === "CV-3000-A");
      expect(front.warnings).toContain(
        "CV-3000-A was fitted to the Model 22 serials 22-1341 to 22-2890; this list is for serial 22-3000.",
      );
    },
  );

  it("refuses another model's serial on a list, naming the field", async () => {
    const refused = await send(
      "post",
      "/api/lists",
      { title: "Wrong plate", machineId: await machineId("Model 22"), machineSerial: "35-2200" },
      { cookie: owner },
    );
    expect(refused.status).toBe(400);
    expect(refused.body.field).toBe("machineSerial");
    const noMachine = await send(
      "post",
      "/api/lists",
      { title: "No machine", machineSerial: "22-100" },
      { cookie: owner },
    );
    expect(noMachine.body.field).toBe("machineSerial");
  });

  it("warns when a part on a machine's list is one no machine of that maker uses", async () => {
    const list = await newList({ machineId: await machineId("HT 25") });
    await send("post", `/api/lists/${list}/lines`, { number: "CV-3003-B" }, { cookie: owner });
    const view = (await send("get", `/api/lists/${list}`, undefined, { cookie: owner })).body;
    expect(view.lines[0].warnings).toContain(
      "CV-3003-B is a Corvane Tractor Works part that no Halvard Maskinfabrik " +
        "machine uses: check it belongs on this list.",
    );
  });
});

describe("look-up that finds", () => {
  const lookup = async (params: Record<string, string>) =>
    (await send("get", `/api/parts/lookup?${new URLSearchParams(params)}`)).body.results as Array<{
      number: string;
      matchedBy: string;
      maker: string;
      description: string;
      best: unknown;
    }>;

  it("puts an exact hit first and still lists similar numbers after it, marked", async () => {
    const results = await lookup({ q: "CV-3003-A", limit: "8" });
    expect(results[0]).toMatchObject({ number: "CV-3003-A", matchedBy: "exact" });
    expect(results.length).toBeGreaterThan(1);
    expect(results.slice(1).every((r) => r.matchedBy === "similar" || r.matchedBy === "prefix")).toBe(true);
  });

  it("ranks the numbers that start with a partial number ahead of scattered matches", async () => {
    const results = await lookup({ q: "CV-30", limit: "20" });
    const prefix = results.filter((r) => r.matchedBy === "prefix");
    expect(prefix.length).toBeGreaterThanOrEqual(10);
    expect(results.slice(0, prefix.length)).toEqual(prefix);
    expect(prefix.every((r) => r.number.startsWith("CV-30"))).toBe(true);
    expect(prefix.every((r) => r.best !== undefined)).toBe(true);
  });

  it("finds parts by words: description, assembly, machine model and maker", async () => {
    const results = await lookup({ q: "water pump bearing model 22", limit: "30" });
    expect(results.map((r) => r.number)).toEqual(
      expect.arrayContaining(["CV-3000-A", "CV-3002-A", "CV-3003-A", "CV-3003-B", "CV-3004-A"]),
    );
    expect(results.every((r) => r.matchedBy === "words" && /water pump bearing/i.test(r.description))).toBe(true);
    const byMaker = await lookup({ q: "halvard fan belt", limit: "30" });
    expect(byMaker.length).toBeGreaterThan(0);
    expect(byMaker.every((r) => r.maker === "Halvard Maskinfabrik" && /fan belt/i.test(r.description))).toBe(true);
  });

  it("keeps the results to one maker when asked", async () => {
    const halvard = (await Maker.findOne({ where: { name: "Halvard Maskinfabrik" } }))!;
    const results = await lookup({ q: "water pump bearing", maker: String(halvard.id), limit: "30" });
    expect(results.length).toBeGreaterThan(0);
    expect(results.every((r) => r.maker === "Halvard Maskinfabrik")).toBe(true);
    expect((await send("get", "/api/parts/lookup?q=bearing&maker=abc")).body.field).toBe("maker");
  });

  it("renders /lookup?q= on the server, with the results and each one's best standard part", async () => {
    const page = await send("get", "/lookup?q=CV-30");
    expect(page.status).toBe(200);
    expect(page.text).toContain("CV-3003-A");
    expect(page.text).toContain("6203-2RS C3");
    expect(page.text).not.toContain("Searching the catalogue");
  });
});
