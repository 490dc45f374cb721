import { Op, QueryTypes, type Transaction } from "sequelize";
import { afterAll, describe, expect, it, vi } from "vitest";
import { Cross, Maker, OriginalPart, sequelize } from "@/db";
import { buildDemoCatalogue } from "@/fixtures/catalogue/build";
import { findPartsBySize, NEAREST_SIZES_SQL } from "@/lib/catalogue/find-by-size";
import { lookUpParts, numberForms, pastPrefix } from "@/lib/catalogue/find-parts";
import { crossLabel, rankCrosses } from "@/lib/catalogue/ranking";
import { latestNumbers } from "@/lib/catalogue/supersessions";
import { send } from "../helpers/api";

afterAll(() => sequelize.close());

const demo = buildDemoCatalogue();
const get = (path: string) => send("get", path);
const lookup = (q: string, limit = 10) => get(`/api/parts/lookup?${new URLSearchParams({ q, limit: String(limit) })}`);

// A demo part with a three-link chain behind it, to test the latest number.
const chainStart = demo.parts.find((p) => {
  const next = (key: string) => demo.supersessions.find((s) => s.oldKey === key)?.newKey;
  const second = next(p.key);
  return second && next(second) && !demo.supersessions.some((s) => s.newKey === p.key);
})!;

describe("GET /api/parts/lookup", () => {
  it("finds a number typed exactly, first, and says why", async () => {
    const { status, body } = await lookup("CV-3003-A");
    expect(status).toBe(200);
    expect(body.results[0]).toMatchObject({
      number: "CV-3003-A",
      maker: "Corvane Tractor Works",
      matchedBy: "exact",
      score: 1,
    });
    expect(Object.keys(body.results[0]).sort()).toEqual(
      [
        "best",
        "category",
        "crossCount",
        "description",
        "id",
        "latestNumber",
        "maker",
        "makerId",
        "matchedBy",
        "number",
        "score",
        "sizes",
        "why",
      ].sort(),
    );
  });

  it("finds it typed sloppily: case, spaces, no dashes", async () => {
    expect((await lookup("cv 3003a")).body.results[0]).toMatchObject({ number: "CV-3003-A", matchedBy: "normalised" });
  });

  it("finds it with the maker's prefix left off", async () => {
    expect((await lookup("3003-A")).body.results[0]).toMatchObject({ number: "CV-3003-A" });
  });

  it("finds it with stamped characters misread: O for 0, I for 1", async () => {
    expect((await lookup("HM 2IO OO7")).body.results[0]).toMatchObject({ number: "HM 210 007", matchedBy: "misread" });
  });

  it("finds it with a typo among similar numbers", async () => {
    const { body } = await lookup("CV-3O3-A"); // a digit dropped and one misread
    expect(body.results.map((r: { number: string }) => r.number)).toContain("CV-3003-A");
  });

  it("reports the latest number of a superseded part", async () => {
    let key = chainStart.key;
    for (
      let next = demo.supersessions.find((s) => s.oldKey === key);
      next;
      next = demo.supersessions.find((s) => s.oldKey === key)
    )
      key = next.newKey;
    const latest = demo.parts.find((p) => p.key === key)!;
    const { body } = await lookup(chainStart.number);
    expect(body.results[0]).toMatchObject({ number: chainStart.number, latestNumber: latest.number });
  });

  it("answers a typed number in one round trip, with the answers the shared ranking gives part by part", async () => {
    await lookUpParts(chainStart.number, { limit: 10 }); // the makers' prefixes, kept for a minute
    const acquire = vi.spyOn(sequelize.connectionManager, "getConnection");
    try {
      for (const typed of [chainStart.number, "CV-3003-A", "cv 3003 a", "CV-3O3-A", "CV-30"]) {
        acquire.mockClear();
        const results = await lookUpParts(typed, { limit: 10 });
        expect(results.length).toBeGreaterThan(0);
        // One statement on one connection, whatever the results found by number need.
        expect(acquire).toHaveBeenCalledTimes(1);
        const ids = results.map((r) => r.id);
        const [latest, crosses] = await Promise.all([latestNumbers(ids), rankCrosses(ids)]);
        for (const r of results) {
          expect(r.latestNumber).toBe(latest.get(r.id));
          expect(r.crossCount).toBe(crosses.get(r.id)!.length);
          expect(r.best?.label ?? null).toBe(crosses.get(r.id)![0] ? crossLabel(crosses.get(r.id)![0]) : null);
        }
      }
    } finally {
      acquire.mockRestore();
    }
  });

  it("finds numbers by their start as a range: every number that starts so, and no other", async () => {
    // The range's end is the prefix with its last character one higher (what LIKE 'CV300%' means, as a range).
    expect(pastPrefix("CV300")).toBe("CV301");
    expect(pastPrefix("")).toBe("");
    const { body } = await lookup("CV-300", 50);
    const prefixed = body.results.filter((r: { matchedBy: string }) => r.matchedBy === "prefix");
    expect(prefixed.length).toBeGreaterThan(1);
    for (const r of prefixed) expect(r.number.replace(/[^A-Z0-9]/g, "")).toMatch(/^CV300/);
  });

  const bad: Array<[string, string]> = [
    ["/api/parts/lookup", "q"],
    ["/api/parts/lookup?q=", "q"],
    [`/api/parts/lookup?q=${"A".repeat(10_000)}`, "q"],
    ["/api/parts/lookup?q=6205&limit=abc", "limit"],
    ["/api/parts/lookup?q=6205&limit=500", "limit"],
  ];
  for (const [path, field] of bad) {
    it(`answers ${path.slice(0, 60)} with 400 naming ${field}`, async () => {
      const { status, body } = await get(path);
      expect(status).toBe(400);
      expect(body.field).toBe(field);
    });
  }

  for (const q of ["'; DROP TABLE original_parts; --", "%_%", "\\x00", "☃☃☃", "  -- . / --  "]) {
    it(`answers ${JSON.stringify(q)} without an error`, async () => {
      const { status, body } = await lookup(q);
      expect(status).toBe(200);
      expect(Array.isArray(body.results)).toBe(true);
    });
  }
});

describe("GET /api/parts/{id}", () => {
  it("gives the part, its chain, crosses, standard dimensions and where it is used", async () => {
    const part = await OriginalPart.findOne({ where: { number: "CV-3003-A" } });
    const { status, body } = await get(`/api/parts/${part!.id}`);
    expect(status).toBe(200);
    expect(body).toMatchObject({ number: "CV-3003-A", category: "bearing", maker: { name: "Corvane Tractor Works" } });
    expect(body.chain.after.length).toBeGreaterThan(0);
    expect(body.crosses[0].standard).toMatchObject({
      kind: "bearing",
      innerMm: expect.any(Number),
      outerMm: expect.any(Number),
    });
    expect(body.whereUsed.length).toBeGreaterThan(0);
    expect(body.dimensions.innerMm).toBeGreaterThan(0);
  });

  it("ranks crosses by fit, then a part to order before a repair method, then by confirmations", async () => {
    const fitRank = { direct: 0, with_modification: 1, dimensions_only: 2 } as const;
    const parts = await OriginalPart.findAll({ limit: 40, order: [["id", "ASC"]] });
    for (const part of parts) {
      const { body } = await get(`/api/parts/${part.id}`);
      const crosses = body.crosses as Array<{
        fit: keyof typeof fitRank;
        confirmations: number;
        standard: object | null;
      }>;
      for (let i = 1; i < crosses.length; i += 1) {
        const [a, b] = [crosses[i - 1], crosses[i]];
        const order =
          fitRank[a.fit] - fitRank[b.fit] ||
          Number(b.standard !== null) - Number(a.standard !== null) ||
          b.confirmations - a.confirmations;
        expect(order).toBeLessThanOrEqual(0);
      }
    }
  });

  it("shows anonymous visitors approved crosses only", async () => {
    const pending = await Cross.findAll({ where: { status: { [Op.ne]: "approved" } } });
    for (const cross of pending.slice(0, 20)) {
      const { body } = await get(`/api/parts/${cross.originalPartId}`);
      const shown = (body.crosses as Array<{ id: number }>).map((c) => c.id);
      expect(shown).not.toContain(cross.id);
      const approved = await Cross.count({ where: { id: shown.length > 0 ? shown : [0], status: "approved" } });
      expect(approved).toBe(shown.length);
    }
  });

  it("answers a malformed id with 400 and a missing one with 404", async () => {
    expect((await get("/api/parts/abc")).status).toBe(400);
    expect((await get("/api/parts/-3")).status).toBe(400);
    expect((await get("/api/parts/99999999")).status).toBe(404);
  });
});

describe("measured-size search in the catalogue", () => {
  it("returns the factory parts whose documented size matches a measured bearing", async () => {
    const part = await OriginalPart.findOne({ where: { number: "CV-3003-A" } });
    const { body } = await get(`/api/bearings/match?bore=${part!.innerMm}&od=${part!.outerMm}&unit=mm`);
    expect(body.catalogueParts.map((p: { number: string }) => p.number)).toContain("CV-3003-A");
  });

  it("returns the factory parts whose documented size matches a measured seal", async () => {
    const seal = await OriginalPart.findOne({ where: { category: "lip_seal" }, order: [["id", "ASC"]] });
    const { body } = await get(`/api/seals/match?shaft=${seal!.innerMm}&bore=${seal!.outerMm}&unit=mm`);
    expect(body.catalogueParts.map((p: { id: number }) => p.id)).toContain(seal!.id);
  });

  it("lists the nearest sizes first, only those within the window, and only of the kind asked for", async () => {
    const found = await findPartsBySize({ category: "bearing", innerMm: 25.1, outerMm: 51.9, toleranceMm: 0.1 });
    expect(found.length).toBeGreaterThan(0);
    const distance = (p: { innerMm: number | null; outerMm: number }) =>
      Math.hypot((p.innerMm ?? 0) - 25.1, p.outerMm - 51.9);
    for (const p of found) {
      expect(Math.abs((p.innerMm ?? 0) - 25.1)).toBeLessThanOrEqual(0.3 + 1e-9);
      expect(Math.abs(p.outerMm - 51.9)).toBeLessThanOrEqual(0.3 + 1e-9);
    }
    const distances = found.map(distance);
    expect(distances).toEqual([...distances].sort((a, b) => a - b));
    const ids = found.map((p) => p.id);
    const kinds = await OriginalPart.findAll({ where: { id: ids }, attributes: ["category"] });
    expect(new Set(kinds.map((k) => k.category))).toEqual(new Set(["bearing"]));
  });

  it("reads the nearest distinct sizes from their index, then each size's parts in number order", async () => {
    const [[{ "QUERY PLAN": plan }]] = (await sequelize.transaction(async (transaction) => {
      // On the small demo catalogue any plan is cheap, and which one wins turns on the statistics of the moment; with
      // scans of whole tables priced out, the plan is the one a large catalogue gets.
      for (const setting of ["enable_seqscan", "enable_bitmapscan"])
        await sequelize.query(`SET LOCAL ${setting} = off`, { transaction });
      return sequelize.query(`EXPLAIN (FORMAT JSON) ${NEAREST_SIZES_SQL}`, {
        replacements: {
          category: "bearing",
          inner: 25.1,
          outer: 51.9,
          innerLo: 24.8,
          innerHi: 25.4,
          outerLo: 51.6,
          outerHi: 52.2,
          limit: 12,
        },
        transaction,
      });
    })) as unknown as [[{ "QUERY PLAN": unknown }]];
    const text = JSON.stringify(plan);
    // The sizes come from the GiST index nearest first (an "Order By" on the index scan), not a sort of the window.
    expect(text).toMatch(/"Index Name":"part_sizes_nearest"[^}]*"Order By"/);
    expect(text).toContain('"Index Name":"original_parts_by_size"');
  });

  it("keeps one count for each size as parts are added, resized and removed", async () => {
    const sizes = async (transaction: Transaction) =>
      sequelize.query<{ inner_mm: number; outer_mm: number; parts: number }>(
        `SELECT inner_mm, outer_mm, parts FROM part_sizes
         WHERE category = 'bearing' AND outer_mm IN (977.5, 978.5) ORDER BY outer_mm`,
        { type: QueryTypes.SELECT, transaction },
      );
    const maker = await Maker.findOne({ order: [["id", "ASC"]] });
    await sequelize
      .transaction(async (transaction) => {
        const q = (sql: string) =>
          sequelize.query(sql, { replacements: { maker: maker!.id }, transaction, type: QueryTypes.SELECT });
        await q(
          `INSERT INTO original_parts (maker_id, number, number_normalised, number_key, category, description,
             inner_mm, outer_mm, created_at, updated_at)
           SELECT :maker, 'SIZE-' || i, 'SIZE' || i, 'SIZE' || i, 'bearing', 'Size count check', 500, 977.5,
             now(), now()
           FROM generate_series(1, 3) AS i`,
        );
        expect(await sizes(transaction)).toEqual([{ inner_mm: 500, outer_mm: 977.5, parts: 3 }]);
        await q("UPDATE original_parts SET outer_mm = 978.5 WHERE number = 'SIZE-1'");
        await q("UPDATE original_parts SET description = 'Size count check, reworded' WHERE number LIKE 'SIZE-%'");
        expect(await sizes(transaction)).toEqual([
          { inner_mm: 500, outer_mm: 977.5, parts: 2 },
          { inner_mm: 500, outer_mm: 978.5, parts: 1 },
        ]);
        const found = await findPartsBySize({
          category: "bearing",
          innerMm: 500,
          outerMm: 977.6,
          toleranceMm: 0.5,
          transaction,
        });
        expect(found.map((p) => p.number)).toEqual(["SIZE-2", "SIZE-3", "SIZE-1"]);
        await q("DELETE FROM original_parts WHERE number IN ('SIZE-1', 'SIZE-2')");
        expect(await sizes(transaction)).toEqual([{ inner_mm: 500, outer_mm: 977.5, parts: 1 }]);
        throw new Error("undone");
      })
      .catch((error: Error) => expect(error.message).toBe("undone"));
  });
});

describe("the forms of each number, for similar numbers", () => {
  const formsOf = async (id: number, transaction?: Transaction) =>
    (
      await sequelize.query<{ variant: string }>("SELECT variant FROM number_variants WHERE part_id = :id", {
        replacements: { id },
        type: QueryTypes.SELECT,
        transaction,
      })
    )
      .map((r) => r.variant)
      .sort();

  it("holds each part's key and the key less each one character, and follows a change of number", async () => {
    const part = await OriginalPart.findOne({ where: { number: "CV-3003-A" } });
    expect(await formsOf(part!.id)).toEqual(numberForms(part!.numberKey).sort());
    await sequelize
      .transaction(async (transaction) => {
        await sequelize.query("UPDATE original_parts SET number_key = 'ZX417' WHERE id = :id", {
          replacements: { id: part!.id },
          transaction,
        });
        expect(await formsOf(part!.id, transaction)).toEqual(["X417", "ZX17", "ZX41", "ZX47", "ZX417", "Z417"].sort());
        throw new Error("undone");
      })
      .catch(() => undefined);
    expect(await formsOf(part!.id)).toEqual(numberForms(part!.numberKey).sort());
  });

  it("finds a number typed with a digit missing or one extra", async () => {
    for (const typed of ["CV-303-A", "CV-30003-A"]) {
      const { body } = await lookup(typed);
      expect(
        body.results.map((r: { number: string }) => r.number),
        typed,
      ).toContain("CV-3003-A");
    }
  });
});
