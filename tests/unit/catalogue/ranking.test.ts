import { describe, expect, it } from "vitest";
import { rankCrossRows, type CrossRow } from "@/lib/catalogue/ranking";
import { coversSerial, parseSerial, serialRangeText } from "@/lib/catalogue/serials";
import { planPositions } from "@/lib/lists/lists";

const row = (over: Partial<CrossRow>): CrossRow => ({
  start_id: 1,
  id: 100,
  part_id: 1,
  number: "A-1",
  fit: "direct",
  standard_part_id: 10,
  repair_method: null,
  notes: null,
  origin: "editor",
  confirmations: 0,
  kind: "bearing",
  designation: "6203-2RS",
  inner_mm: 17,
  outer_mm: 40,
  width_mm: 12,
  length_mm: null,
  attributes: {},
  ...over,
});

describe("rankCrossRows: one order for a part's crosses", () => {
  it("puts the best fit first, then a part to order before a repair method, then the most confirmations", () => {
    const ranked = rankCrossRows(1, [
      row({ id: 1, fit: "with_modification", standard_part_id: 11, designation: "6203-2Z", confirmations: 9 }),
      row({
        id: 2,
        standard_part_id: null,
        kind: null,
        designation: null,
        repair_method: "Cut from key steel",
        confirmations: 7,
      }),
      row({ id: 3, standard_part_id: 12, designation: "6203-2RS C3", confirmations: 2 }),
      row({ id: 4, standard_part_id: 10, designation: "6203-2RS", confirmations: 5 }),
    ]);
    expect(ranked.map((c) => c.id)).toEqual([4, 3, 2, 1]);
  });

  it(
    "shows one standard part once, the part's own record kept, with the " +
      "confirmations of every number of the chain",
    () => {
      const ranked = rankCrossRows(1, [
        row({ id: 7, part_id: 2, number: "A-2", confirmations: 4 }),
        row({ id: 8, part_id: 1, number: "A-1", confirmations: 1 }),
        row({ id: 9, part_id: 2, number: "A-2", standard_part_id: 12, designation: "6203-2RS C3", confirmations: 3 }),
      ]);
      expect(ranked).toEqual([
        expect.objectContaining({ id: 8, viaNumber: null, confirmations: 5 }),
        expect.objectContaining({ id: 9, viaNumber: "A-2", confirmations: 3 }),
      ]);
    },
  );

  it("breaks a tie in favour of the part's own cross, then by name, so the order never wobbles", () => {
    const ranked = rankCrossRows(1, [
      row({ id: 20, part_id: 2, number: "A-2", standard_part_id: 30, designation: "6203-2RS", confirmations: 2 }),
      row({ id: 21, part_id: 1, standard_part_id: 31, designation: "6303-2RS", confirmations: 2 }),
      row({ id: 22, part_id: 1, standard_part_id: 32, designation: "6203-2Z", confirmations: 2 }),
    ]);
    expect(ranked.map((c) => c.standard?.designation)).toEqual(["6203-2Z", "6303-2RS", "6203-2RS"]);
  });
});

describe("machine serials", () => {
  it("reads a serial as on the plate, with or without the machine's prefix", () => {
    expect(parseSerial("22-4100", "22-")).toBe(4100);
    expect(parseSerial(" 4100 ", "22-")).toBe(4100);
    expect(parseSerial("k40 2650", "K40-")).toBe(2650);
    expect(parseSerial("K402650", "K40-")).toBe(2650);
    // Digits alone are the running number: 2200 on a Model 22 is serial 22-2200, not 22-00.
    expect(parseSerial("2200", "22-")).toBe(2200);
  });

  it("refuses another model's serial and text that is no serial, naming the field", () => {
    expect(() => parseSerial("35-2200", "22-")).toThrow(/start 22-/);
    expect(() => parseSerial("early", "22-")).toThrow(expect.objectContaining({ options: { field: "machineSerial" } }));
  });

  it("says a range in words and tells whether a serial falls in it (both ends included)", () => {
    expect(serialRangeText({ serialFrom: null, serialTo: null }, "22-")).toBeNull();
    expect(serialRangeText({ serialFrom: null, serialTo: 1340 }, "22-")).toBe("to serial 22-1340");
    expect(serialRangeText({ serialFrom: 1341, serialTo: null }, "22-")).toBe("from serial 22-1341");
    expect(serialRangeText({ serialFrom: 1341, serialTo: 2890 }, "22-")).toBe("serials 22-1341 to 22-2890");
    expect(coversSerial({ serialFrom: 1341, serialTo: 2890 }, 1341)).toBe(true);
    expect(coversSerial({ serialFrom: 1341, serialTo: 2890 }, 2890)).toBe(true);
    expect(coversSerial({ serialFrom: 1341, serialTo: 2890 }, 2891)).toBe(false);
    expect(coversSerial({ serialFrom: null, serialTo: null }, 1)).toBe(true);
  });
});

describe("planPositions: one part for each position of an assembly", () => {
  const usage = (part_id: number, position: string, serial_from: number | null, serial_to: number | null) => ({
    part_id,
    position,
    quantity: 1,
    serial_from,
    serial_to,
  });
  const positions = new Map([
    ["front", [usage(1, "front", null, 1340), usage(2, "front", 1341, null)]],
    ["rear", [usage(3, "rear", null, null)]],
  ]);
  const latestOf = new Map([
    [1, 11],
    [2, 2],
    [3, 3],
  ]);
  const open = { serialFrom: null, serialTo: null };

  it("takes the part for the serial, under its latest number", () => {
    expect(planPositions(positions, latestOf, 1000, open)).toEqual({
      planned: [
        { partId: 11, quantity: 1 },
        { partId: 3, quantity: 1 },
      ],
      undecided: [],
    });
    expect(planPositions(positions, latestOf, 1341, open).planned).toContainEqual({ partId: 2, quantity: 1 });
  });

  it("with no serial, lets the line's own serials decide, and leaves the rest to ask about", () => {
    expect(planPositions(positions, latestOf, null, { serialFrom: null, serialTo: 900 }).planned).toEqual([
      { partId: 11, quantity: 1 },
      { partId: 3, quantity: 1 },
    ]);
    const asked = planPositions(positions, latestOf, null, open);
    expect(asked.planned).toEqual([{ partId: 3, quantity: 1 }]);
    expect(asked.undecided).toHaveLength(1);
  });
});
