import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { BELT_SECTIONS, R40 } from "@/lib/standards/belt-sections";
import { beltLengths, BeltError, decodeBelt, findSection, identifySection, nearestStandardLengths, standardLengthsForPitch } from "@/lib/standards/belts";

describe("belt designations", () => {
  it("reads B60 as a classical B belt of 60 in inside length", () => {
    // RMA/MPTA IP-20: classical belts are numbered by inside length; B pitch length = inside + 1.8 in (from memory).
    expect(decodeBelt("B60")).toMatchObject({ section: "B", unit: "in", insideLength: 60, pitchLength: 61.8, topWidth: 0.65625 });
  });

  it("puts the outside length of a classical belt 2π × height beyond the inside", () => {
    // Geometry: the outer face runs on a circle one belt height further out, 2π·h longer. A: h = 5/16 in.
    expect(decodeBelt("A40").outsideLength).toBeCloseTo(40 + 2 * Math.PI * 0.3125, 2);
  });

  it("reads 4L380 as 38.0 in outside and 5V800 as 80.0 in outside", () => {
    // RMA light-duty and narrow belts are numbered by outside (effective) length in tenths of an inch.
    expect(decodeBelt("4L380")).toMatchObject({ section: "4L", outsideLength: 38 });
    expect(decodeBelt("5V800")).toMatchObject({ section: "5V", outsideLength: 80 });
  });

  it("reads SPA1250 as 1250 mm datum length, 1205 inside and 1268 outside", () => {
    // ISO 4184 numbers SP belts by datum length. Inside = datum − 45 mm and outside ≈ datum + 18 mm for SPA:
    // from memory of makers' conversion tables.
    const belt = decodeBelt("spa 1250");
    expect(belt).toMatchObject({ section: "SPA", unit: "mm", pitchLength: 1250, insideLength: 1205 });
    expect(belt.outsideLength).toBeCloseTo(1268, -1);
  });

  for (const bad of ["", "Q60", "B", "4L38.5", "SPA", "B0"]) {
    it(`refuses ${JSON.stringify(bad)} with a reason`, () => expect(() => decodeBelt(bad)).toThrow(BeltError));
  }

  it("returns to the same inside length through the pitch length, for every section", () => {
    // Property: inside → pitch → inside is the identity.
    const sections = BELT_SECTIONS.filter((s) => s.height !== null);
    fc.assert(
      fc.property(fc.constantFrom(...sections), fc.double({ min: 10, max: 5000, noNaN: true }), (section, inside) => {
        const pitch = beltLengths(section, "inside", inside).pitch;
        return Math.abs(beltLengths(section, "pitch", pitch).inside - inside) < 1e-9 * inside;
      }),
    );
  });
});

describe("standard lengths", () => {
  it("offers ISO narrow belts from the R40 preferred numbers", () => {
    // ISO 3 preferred numbers, R40 series: …, 1180, 1250, 1320, …
    expect(R40).toContain(125);
    expect(nearestStandardLengths(findSection("SPA"), 1262).map((l) => l.designation)).toEqual(["SPA1180", "SPA1250", "SPA1320"]);
  });

  it("names the nearest classical belts for a drive's pitch length", () => {
    // B: inside = pitch − 1.8 in (IP-20, from memory); whole-inch stock lengths are common practice.
    const near = standardLengthsForPitch(findSection("B"), 61.8 * 25.4).map((l) => l.designation);
    expect(near).toContain("B60");
  });
});

describe("identifying a section from a measured belt", () => {
  it("takes 0.50 × 0.31 in as A, and says 4L is the light-duty twin", () => {
    // A and 4L: 1/2 × 5/16 in (RMA/MPTA IP-20 and IP-23).
    const found = identifySection({ topWidthMm: 0.5 * 25.4, heightMm: 0.31 * 25.4, unit: "in" });
    expect(found[0].section).toBe("A");
    expect(found.find((c) => c.section === "4L")?.warnings.join(" ")).toMatch(/fractional-horsepower/);
  });

  it("ranks an automotive section, which has no thickness on file, below one that confirms the thickness", () => {
    const found = identifySection({ topWidthMm: 0.5 * 25.4, heightMm: 0.31 * 25.4, unit: "in" });
    const auto = found.findIndex((c) => c.family === "automotive");
    expect(auto).toBeGreaterThan(found.findIndex((c) => c.section === "A"));
  });

  it("tells SPA from A by depth though their tops are nearly the same", () => {
    // SPA: 12.7 × 10 mm (ISO 4184); A: 1/2 × 5/16 in = 12.7 × 7.9 mm (IP-20).
    const found = identifySection({ topWidthMm: 12.6, heightMm: 10, unit: "mm" });
    expect(found[0].section).toBe("SPA");
    expect(found[0].warnings.join(" ")).toMatch(/^A has nearly the same top width but is 2.06 mm shallower/);
  });
});
