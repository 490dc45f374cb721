import iconv from "iconv-lite";
import { describe, expect, it } from "vitest";
import { missingRequired, proposeMapping } from "@/lib/imports/mapping";
import { detectShape } from "@/lib/imports/read";
import { parseImportRow } from "@/lib/imports/rows";

const mapping = proposeMapping([
  "Maker",
  "Part No.",
  "Description",
  "Kind",
  "Bore (mm)",
  "OD (mm)",
  "Width (mm)",
  "Length (mm)",
  "Standard designation",
  "Fit",
  "Notes",
]);
const row = (values: Record<string, string>) =>
  parseImportRow(
    {
      Maker: "Corvane Tractor Works",
      "Part No.": "CV-1",
      Description: "Fan bearing",
      Kind: "bearing",
      "Standard designation": "6205-2RS",
      ...values,
    },
    mapping,
  );

describe("matching column titles to fields", () => {
  it("reads common titles whatever their case and punctuation, each column once", () => {
    expect(mapping).toMatchObject({
      maker: "Maker",
      number: "Part No.",
      category: "Kind",
      innerMm: "Bore (mm)",
      outerMm: "OD (mm)",
      designation: "Standard designation",
      machine: null,
    });
    expect(missingRequired(mapping)).toEqual([]);
    expect(missingRequired(proposeMapping(["Maker", "Stamped as", "Replacement"]))).toEqual(["Factory number"]);
  });
});

describe("reading one row", () => {
  it("accepts sizes in mm, with a decimal comma, or in inches", () => {
    // 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
    const result = row({ "Bore (mm)": "25,0", "OD (mm)": "2.047 in", "Width (mm)": "15" });
    expect(result.ok && result.row).toMatchObject({
      innerMm: 25,
      outerMm: 51.994,
      widthMm: 15,
      fit: "dimensions_only",
      fitGiven: false,
    });
  });

  it("rejects a bearing whose designation contradicts the sizes given, naming the column", () => {
    // ISO 15:2017 series 62 (DIN 625-1 via BOLTS): 6205 is 25 × 52 × 15 mm.
    const result = row({ "Bore (mm)": "25", "OD (mm)": "47", "Width (mm)": "15" });
    expect(result).toMatchObject({ ok: false, problem: { column: "OD (mm)" } });
  });

  it("rejects an unknown category, an unreadable size, an unknown fit and a missing designation", () => {
    expect(row({ Kind: "sprocket" })).toMatchObject({ ok: false, problem: { column: "Kind" } });
    expect(row({ "Bore (mm)": "about 25" })).toMatchObject({ ok: false, problem: { column: "Bore (mm)" } });
    expect(row({ Fit: "perfect" })).toMatchObject({ ok: false, problem: { column: "Fit" } });
    expect(row({ "Standard designation": "" })).toMatchObject({
      ok: false,
      problem: { column: "Standard designation" },
    });
  });

  it("takes the standard part's kind from the category, and reads fits in plain words", () => {
    const result = row({ Kind: "Lip seal", "Standard designation": "35 x 52 x 8", Fit: "With modification" });
    expect(result.ok && result.row.standard).toMatchObject({ kind: "lip_seal", innerMm: 35, outerMm: 52, widthMm: 8 });
    expect(result.ok && result.row.fit).toBe("with_modification");
  });
});

describe("working out how a file was saved", () => {
  it("tells UTF-8 (with its byte-order mark) from Windows-1252, and a comma from a semicolon", () => {
    const utf8 = new Uint8Array([
      0xef,
      0xbb,
      0xbf,
      ...new TextEncoder().encode("Maker,Part No.,Description\r\nHalvard,HM 1,Lüfter\r\n"),
    ]);
    expect(detectShape(utf8)).toEqual({
      encoding: "utf-8",
      delimiter: ",",
      headers: ["Maker", "Part No.", "Description"],
    });
    const ansi = iconv.encode("Hersteller;Teilenummer;Bezeichnung\r\nHalvard;HM 1;Lüfter, groß\r\n", "win1252");
    expect(detectShape(new Uint8Array(ansi))).toEqual({
      encoding: "windows-1252",
      delimiter: ";",
      headers: ["Hersteller", "Teilenummer", "Bezeichnung"],
    });
  });

  it("refuses a first line that is not column titles, or titles used twice", () => {
    expect(() => detectShape(new TextEncoder().encode("a note\n"))).toThrow(/column titles/);
    expect(() => detectShape(new TextEncoder().encode("Maker,Maker\n"))).toThrow(/appears twice/);
  });
});

describe("streaming a file's rows", () => {
  it("keeps empty and repeated cells as they are, row after row, and counts lines as an editor does", async () => {
    const { Readable } = await import("node:stream");
    const { rowsFromStream } = await import("@/lib/imports/read");
    const lines = [
      "Maker,Part No.,Fit,Notes",
      ...Array.from({ length: 3000 }, (_, i) => `Halvard,HM ${i},,`),
      "",
      'Halvard,HM last,direct,"a, b"',
    ];
    const text = new TextEncoder().encode(lines.join("\r\n"));
    const chunks = Array.from({ length: Math.ceil(text.length / 4096) }, (_, i) =>
      Buffer.from(text.subarray(i * 4096, (i + 1) * 4096)),
    );
    const rows = [];
    for await (const row of rowsFromStream(Readable.from(chunks), { encoding: "utf-8", delimiter: ",", headers: [] }))
      rows.push(row);
    expect(rows).toHaveLength(3001);
    expect(rows.every((r, i) => i === 3000 || (r.record.Fit === "" && r.record.Notes === ""))).toBe(true);
    expect(rows[2999]).toMatchObject({ line: 3001, record: { "Part No.": "HM 2999" } });
    expect(rows[3000]).toMatchObject({ line: 3003, record: { Fit: "direct", Notes: "a, b" } });
  });
});
