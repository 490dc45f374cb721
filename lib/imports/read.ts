import { Readable, Transform } from "node:stream";
import { GetObjectCommand } from "@aws-sdk/client-s3";
import iconv from "iconv-lite";
import Papa from "papaparse";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { storageClient } from "@/lib/storage/s3";

export type Encoding = "utf-8" | "windows-1252";

export interface FileShape {
  encoding: Encoding;
  delimiter: "," | ";" | "\t";
  headers: string[];
}

/**
 * Works out how a spreadsheet was saved from its first bytes: UTF-8 (with or without a byte-order mark) when they
 * decode as UTF-8, otherwise Windows-1252, which is what spreadsheet programs on Windows write as "CSV"; and the
 * delimiter from the header line: comma, or semicolon where the decimal mark is a comma, or tab.
 */
export function detectShape(sample: Uint8Array): FileShape {
  let encoding: Encoding = "utf-8";
  let start = 0;
  if (sample[0] === 0xef && sample[1] === 0xbb && sample[2] === 0xbf) start = 3;
  // A multi-byte character may be cut at the end of the sample: leave up to three bytes out of the test.
  const body = sample.subarray(start, Math.max(start, sample.length - (sample.length >= 65_536 ? 3 : 0)));
  try {
    new TextDecoder("utf-8", { fatal: true }).decode(body);
  } catch {
    encoding = "windows-1252";
  }
  const text =
    encoding === "utf-8"
      ? new TextDecoder("utf-8").decode(sample.subarray(start))
      : iconv.decode(Buffer.from(sample), "win1252");
  const firstLine = text.split(/\r?\n/, 1)[0] ?? "";
  if (firstLine.trim() === "")
    throw new AppError("validation_failed", "The file's first line is empty: it should hold the column titles.", {
      field: "file",
    });
  const outsideQuotes = firstLine.replace(/"[^"]*"/g, "");
  const counts = ([",", ";", "\t"] as const).map((d) => [d, outsideQuotes.split(d).length - 1] as const);
  const [delimiter] = [...counts].sort((a, b) => b[1] - a[1])[0];
  const headers = (Papa.parse<string[]>(firstLine, { delimiter }).data[0] ?? []).map((h) => h.trim());
  if (headers.length < 2 || headers.every((h) => h === "")) {
    throw new AppError(
      "validation_failed",
      "The first line does not look like column titles separated by commas or semicolons.",
      { field: "file" },
    );
  }
  const seen = new Set<string>();
  for (const h of headers) {
    if (h && seen.has(h))
      throw new AppError(
        "validation_failed",
        `The column title "${h}" appears twice; give each column its own title.`,
        { field: "file" },
      );
    seen.add(h);
  }
  return { encoding, delimiter, headers };
}

export async function readSample(key: string, bytes = 65_536): Promise<Uint8Array> {
  const result = await storageClient().send(
    new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key, Range: `bytes=0-${bytes - 1}` }),
  );
  return result.Body ? await result.Body.transformToByteArray() : new Uint8Array();
}

export interface CsvRecord {
  line: number;
  record: Record<string, string | undefined>;
}

/**
 * The stored file's rows, one at a time, decoded and parsed as they stream from storage: a 100,000-row file never
 * sits in memory whole. `line` counts the header as line 1 and blank lines too; a quoted cell with line breaks in it
 * counts as one line. `onBytes` reports progress through the file.
 */
export async function* streamRows(
  key: string,
  shape: FileShape,
  onBytes: (bytes: number) => void,
): AsyncGenerator<CsvRecord> {
  const result = await storageClient().send(new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
  if (!result.Body) throw new Error(`Stored import ${key} has no body`);
  yield* rowsFromStream(result.Body as Readable, shape, onBytes);
}

/**
 * Parses a byte stream of CSV into records keyed by the column titles. papaparse's own header mode is not used:
 * when streaming, it treats repeated cell values in data rows as repeated titles and renames them (`""` becomes
 * `"_1"`), so rows are read as arrays and keyed here.
 */
export async function* rowsFromStream(
  bytes: Readable,
  shape: FileShape,
  onBytes: (bytes: number) => void = () => {},
): AsyncGenerator<CsvRecord> {
  let count = 0;
  const counter = new Transform({
    transform(chunk: Buffer, _encoding, callback) {
      count += chunk.length;
      onBytes(count);
      callback(null, chunk);
    },
  });
  const decoded = bytes
    .pipe(counter)
    .pipe(iconv.decodeStream(shape.encoding === "utf-8" ? "utf8" : "win1252", { stripBOM: true }));
  const parser = Papa.parse(Papa.NODE_STREAM_INPUT, { header: false, delimiter: shape.delimiter });
  const rows = decoded.pipe(parser as unknown as NodeJS.WritableStream) as unknown as Readable;
  let line = 0;
  let headers: string[] | null = null;
  for await (const cells of rows) {
    line += 1;
    const values = cells as string[];
    if (!headers) {
      headers = values.map((h) => h.trim());
      continue;
    }
    // Blank lines are skipped but still counted, so that line numbers match what a text editor shows.
    if (values.every((v) => v.trim() === "")) continue;
    const record: Record<string, string | undefined> = {};
    headers.forEach((h, i) => {
      if (h) record[h] = values[i];
    });
    yield { line, record };
  }
}
