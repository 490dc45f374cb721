import { describe, expect, it } from "vitest";
import { buildDemoCatalogue } from "@/fixtures/catalogue/build";
import { decodeBearing } from "@/lib/standards/bearings";
import { decodeBelt } from "@/lib/standards/belts";
import { checkStandard } from "@/lib/proposals/checks";
import { PART_CATEGORIES } from "@/lib/catalogue/kinds";

const demo = buildDemoCatalogue();

describe("the invented demo catalogue", () => {
  it("is as large as the demo needs", () => {
    expect(demo.makers.length).toBeGreaterThanOrEqual(3);
    expect(demo.machines.length).toBeGreaterThanOrEqual(12);
    expect(demo.parts.length).toBeGreaterThanOrEqual(600);
    expect(demo.crosses.length).toBeGreaterThanOrEqual(1500);
  });

  it("covers every category of part", () => {
    expect(new Set(demo.parts.map((p) => p.category))).toEqual(new Set(PART_CATEGORIES));
  });

  it("has supersession chains up to four numbers long, and parts shared between machines", () => {
    const next = new Map(demo.supersessions.map((s) => [s.oldKey, s.newKey]));
    const length = (key: string): number => (next.has(key) ? 1 + length(next.get(key)!) : 1);
    const longest = Math.max(...demo.parts.map((p) => length(p.key)));
    expect(longest).toBe(4);
    const machinesPerPart = new Map<string, Set<string>>();
    for (const u of demo.usages)
      machinesPerPart.set(u.partKey, (machinesPerPart.get(u.partKey) ?? new Set()).add(u.machineKey));
    expect([...machinesPerPart.values()].filter((s) => s.size > 1).length).toBeGreaterThan(20);
  });

  it("gives every factory number once per maker, and every part a use", () => {
    expect(new Set(demo.parts.map((p) => `${p.makerKey}|${p.number}`)).size).toBe(demo.parts.length);
    const used = new Set(demo.usages.map((u) => u.partKey));
    expect(demo.parts.every((p) => used.has(p.key))).toBe(true);
  });

  it("records bearing standard parts with exactly the engine's dimensions", () => {
    for (const s of demo.standardParts.filter((x) => x.kind === "bearing")) {
      const engine = decodeBearing(s.designation);
      expect([s.innerMm, s.outerMm, s.widthMm]).toEqual([engine.boreMm, engine.outsideDiameterMm, engine.widthMm]);
    }
  });

  it("names only belts the engine can read", () => {
    for (const s of demo.standardParts.filter((x) => x.kind === "v_belt"))
      expect(() => decodeBelt(s.designation)).not.toThrow();
  });

  it("documents the sizes of every bearing and lip seal", () => {
    for (const p of demo.parts.filter((x) => x.category === "bearing" || x.category === "lip_seal")) {
      expect(p.innerMm).toBeGreaterThan(0);
      expect(p.outerMm).toBeGreaterThan(p.innerMm!);
    }
  });

  it("lays the parts of one position on one machine end to end over the serials: one part for any serial", () => {
    const groups = new Map<string, typeof demo.usages>();
    for (const u of demo.usages.filter((x) => !x.serialNote?.startsWith("Service replacement"))) {
      const key = `${u.machineKey}|${u.assembly}|${u.position}`;
      groups.set(key, [...(groups.get(key) ?? []), u]);
    }
    for (const group of groups.values()) {
      const sorted = [...group].sort((a, b) => (a.serialFrom ?? -1) - (b.serialFrom ?? -1));
      expect(sorted[0].serialFrom).toBeNull();
      expect(sorted.at(-1)!.serialTo).toBeNull();
      for (let i = 1; i < sorted.length; i += 1) expect(sorted[i].serialFrom).toBe(sorted[i - 1].serialTo! + 1);
    }
  });

  it("gives each maker a numbering shape of its own, and machines names of their own", () => {
    const shapes: Record<string, RegExp> = {
      corvane: /^CV-\d{4}-[A-E]$/,
      halvard: /^HM \d{3} \d{3}( [A-D])?$/,
      pellworth: /^\d{4}\.[FGHKM][1-9]( R\d)?$/,
    };
    for (const p of demo.parts) expect(p.number).toMatch(shapes[p.makerKey]);
    // A digit, a letter, a dash and four digits is a real maker's numbering shape; the demo uses none like it.
    expect(demo.parts.some((p) => /^\d[A-Z]-\d{4}/.test(p.number))).toBe(false);
    expect(buildDemoCatalogue()).toEqual(demo);
  });
});

describe("the demo's felt, packing, plug, gasket, key, pin, thread, grease fitting and chain parts", () => {
  it("are standard parts the engine reads back to the sizes they were recorded with", () => {
    const kinds = ["felt", "packing", "plug", "gasket", "key", "pin", "thread", "grease_fitting", "chain"] as const;
    for (const kind of kinds) {
      const parts = demo.standardParts.filter((s) => s.kind === kind);
      expect(parts.length, kind).toBeGreaterThan(0);
      for (const s of parts) {
        const template = typeof s.attributes.template === "string" ? s.attributes.template : undefined;
        const read = checkStandard({ kind, designation: s.designation, template });
        for (const key of ["innerMm", "outerMm", "widthMm"] as const)
          if (s[key] !== null) expect(read[key], `${s.designation} ${key}`).toBeCloseTo(s[key]!, 2);
      }
    }
  });

  it("pack every water pump with gland packing and cut its body gasket to a template", () => {
    const packings = demo.parts.filter((p) => p.category === "packing");
    expect(packings.length).toBeGreaterThanOrEqual(2);
    const gaskets = demo.parts.filter((p) => p.description === "Water pump body gasket");
    const standardKeys = new Map(demo.standardParts.map((s) => [s.key, s]));
    for (const g of gaskets)
      expect(
        demo.crosses.some((c) => c.partKey === g.key && standardKeys.get(c.standardKey ?? "")?.kind === "gasket"),
      ).toBe(true);
  });
});
