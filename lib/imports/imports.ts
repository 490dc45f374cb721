import { createHash, randomBytes } from "node:crypto";
import Papa from "papaparse";
import { QueryTypes } from "sequelize";
import { Import, ImportMapping, sequelize } from "@/db";
import { recordAudit } from "@/lib/audit/record";
import { hasPermission, type Role } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";
import { runPass, type Rejection } from "@/lib/imports/engine";
import type { ChunkWriter } from "@/lib/imports/write";
import {
  IMPORT_MAX_BYTES,
  type ImportCounts,
  type ImportMappingValue,
  type ImportStatus,
  type ImportTarget,
} from "@/lib/imports/kinds";
import { cleanMapping, missingRequired, proposeMapping } from "@/lib/imports/mapping";
import { detectShape, readSample, type FileShape } from "@/lib/imports/read";
import { deleteObject, putObject } from "@/lib/storage/s3";

interface Actor {
  id: string;
  role: Role;
}

function assertMayImport(actor: Actor, target: ImportTarget): void {
  const permission = target === "catalogue" ? "imports:commit" : "imports:review-queue";
  if (!hasPermission(actor.role, permission)) {
    throw new AppError(
      "forbidden",
      target === "catalogue"
        ? "Only admins import into the catalogue; moderators may import into the review queue."
        : "Your account's role does not allow imports.",
    );
  }
}

function shapeOf(row: Import): FileShape {
  return {
    encoding: row.encoding as FileShape["encoding"],
    delimiter: row.delimiter as FileShape["delimiter"],
    headers: row.headers,
  };
}

/**
 * Stores the uploaded file as it came, before anything reads it, then works out its encoding, delimiter and column
 * titles and matches them to the catalogue's fields. The dry run is started by the caller.
 */
/**
 * Why the bytes are not a CSV file we can read, or null. UTF-8 and Windows-1252 text never hold a NUL byte; UTF-16
 * text (what some spreadsheets save as "Unicode text") and binary files (a photo, a workbook) do.
 */
export function whyNotCsvText(bytes: Uint8Array): string | null {
  const utf16Bom = (bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff);
  if (utf16Bom) return "The file is UTF-16 text. Save it as CSV (UTF-8 or Windows-1252) and upload it again.";
  if (bytes.includes(0)) {
    return (
      "The file holds binary data, so it is not a CSV file (a workbook or a " +
      "photo, perhaps). Save it as CSV and upload it again."
    );
  }
  return null;
}

/** An uploaded file taken in: the target is the one asked for, or the widest the role allows; its dry run is next. */
export async function startImport(actor: Actor, file: File, fields: { target?: ImportTarget; mappingId?: number }) {
  const target = fields.target ?? (hasPermission(actor.role, "imports:commit") ? "catalogue" : "review_queue");
  const created = await createImport(
    actor,
    { name: file.name, bytes: new Uint8Array(await file.arrayBuffer()) },
    target,
    fields.mappingId,
  );
  return created.id;
}

export async function createImport(
  actor: Actor,
  file: { name: string; bytes: Uint8Array },
  target: ImportTarget,
  mappingId?: number,
): Promise<Import> {
  assertMayImport(actor, target);
  if (file.bytes.length === 0) throw new AppError("validation_failed", "The file is empty.", { field: "file" });
  if (file.bytes.length > IMPORT_MAX_BYTES)
    throw new AppError("validation_failed", `The file is larger than ${IMPORT_MAX_BYTES / 1024 / 1024} MB.`, {
      field: "file",
    });
  const notText = whyNotCsvText(file.bytes);
  if (notText) throw new AppError("validation_failed", notText, { field: "file" });
  const saved = mappingId ? await ImportMapping.findByPk(mappingId) : null;
  if (mappingId && !saved)
    throw new AppError("validation_failed", "There is no saved column mapping with that id.", { field: "mappingId" });

  const key = `imports/${new Date().toISOString().slice(0, 7)}/${randomBytes(18).toString("base64url")}.csv`;
  await putObject(key, file.bytes, "text/csv");
  const record = await Import.create({
    userId: actor.id,
    target,
    objectKey: key,
    // Control characters (a NUL above all) cannot be stored as text and never belong in a file name.
    fileName: file.name.replace(/[\u0000-\u001f\u007f]/g, "").slice(0, 200) || "import.csv",
    sizeBytes: file.bytes.length,
    sha256: createHash("sha256").update(file.bytes).digest("hex"),
    encoding: null,
    delimiter: null,
    headers: [],
    mapping: {},
  });
  try {
    const shape = detectShape(await readSample(key));
    const mapping = saved ? cleanMapping(saved.mapping, shape.headers) : proposeMapping(shape.headers);
    await record.update({ encoding: shape.encoding, delimiter: shape.delimiter, headers: shape.headers, mapping });
  } catch (error) {
    await record.update({ status: "failed", errorMessage: error instanceof Error ? error.message : String(error) });
    throw error;
  }
  await recordAudit({
    actorId: actor.id,
    action: "import.upload",
    subjectType: "import",
    subjectId: record.id,
    after: { fileName: record.fileName, target, sha256: record.sha256 },
  });
  return record;
}

async function loadFor(actor: Actor, id: number): Promise<Import> {
  const row = await Import.findByPk(id);
  if (!row || !hasPermission(actor.role, "imports:review-queue"))
    throw new AppError("not_found", "There is no import with that id.");
  return row;
}

/** Changes the column mapping; the caller runs the dry run again. */
export async function setMapping(actor: Actor, id: number, mapping: Record<string, unknown>): Promise<Import> {
  const row = await loadFor(actor, id);
  assertMayImport(actor, row.target);
  if (!["parsed", "uploaded", "failed"].includes(row.status) || row.committedAt)
    throw new AppError("conflict", "This import is committed or busy; its mapping can no longer change.");
  await row.update({
    mapping: cleanMapping(mapping, row.headers),
    status: "uploaded",
    counts: null,
    errorMessage: null,
  });
  return row;
}

export async function saveMapping(
  actor: Actor,
  name: string,
  mapping: Record<string, unknown>,
): Promise<ImportMapping> {
  if (!hasPermission(actor.role, "imports:review-queue"))
    throw new AppError("forbidden", "Your account's role does not allow imports.");
  const clean = cleanMapping(
    mapping,
    Object.values(mapping).filter((v): v is string => typeof v === "string"),
  );
  // The name is the mapping's identity: saving under a name already used replaces that mapping.
  const [saved] = await ImportMapping.upsert(
    { name, mapping: clean, createdBy: actor.id },
    { returning: true, conflictFields: ["name"] },
  );
  return saved;
}

export async function savedMappings(): Promise<Array<{ id: number; name: string; mapping: ImportMappingValue }>> {
  const rows = await ImportMapping.findAll({ order: [["name", "ASC"]] });
  return rows.map((m) => ({ id: m.id, name: m.name, mapping: m.mapping }));
}

const progressWriter = (id: number, phase: "parsing" | "committing", totalBytes: number) => {
  let last = 0;
  return async (rows: number, bytes: number) => {
    if (Date.now() - last < 250) return;
    last = Date.now();
    await sequelize.query("UPDATE imports SET progress = :progress, updated_at = now() WHERE id = :id", {
      replacements: { id, progress: JSON.stringify({ phase, rows, bytes, totalBytes }) },
    });
  };
};

/** Reads the whole file without changing the catalogue: counts, and every rejected row with its line and reason. */
export async function dryRun(id: number): Promise<void> {
  const [claimed] = (await sequelize.query(
    "UPDATE imports SET status = 'parsing', counts = NULL, error_message = " +
      "NULL, updated_at = now() WHERE id = :id AND status = 'uploaded' " +
      "RETURNING id",
    { replacements: { id } },
  )) as [unknown[], unknown];
  if (claimed.length === 0) return;
  const row = (await Import.findByPk(id))!;
  const missing = missingRequired(row.mapping);
  if (missing.length > 0) {
    await row.update({
      status: "parsed",
      counts: null,
      progress: null,
      errorMessage: `Choose the columns for: ${missing.join(", ")}.`,
    });
    return;
  }
  try {
    await sequelize.query("DELETE FROM import_rejections WHERE import_id = :id", { replacements: { id } });
    const counts = await runPass({
      importId: id,
      userId: row.userId,
      target: row.target,
      key: row.objectKey,
      shape: shapeOf(row),
      mapping: row.mapping,
      onRejections: (rejections) => storeRejections(id, rejections),
      onProgress: progressWriter(id, "parsing", row.sizeBytes),
    });
    await row.update({
      status: "parsed",
      counts,
      progress: { phase: "parsing", rows: counts.rows, bytes: row.sizeBytes, totalBytes: row.sizeBytes },
    });
  } catch (error) {
    console.error("[understudy] import dry run failed", error);
    await row.update({
      status: "failed",
      errorMessage: `The file could not be read to the end: ${error instanceof Error ? error.message : String(error)}`,
    });
  }
}

async function storeRejections(id: number, rejections: Rejection[]): Promise<void> {
  await sequelize.getQueryInterface().bulkInsert(
    "import_rejections",
    rejections.map((r) => ({
      import_id: id,
      line: r.line,
      column_name: r.column,
      reason: r.reason,
      raw: JSON.stringify(r.raw),
    })),
  );
}

/** Claims a parsed import for committing; only one commit of an import can ever start. */
export async function startCommit(actor: Actor, id: number): Promise<Import> {
  const row = await loadFor(actor, id);
  assertMayImport(actor, row.target);
  if (!row.counts)
    throw new AppError("conflict", row.errorMessage ?? "Run the dry run first: the import has not been read yet.");
  const [claimed] = (await sequelize.query(
    "UPDATE imports SET status = 'committing', error_message = NULL, " +
      "updated_at = now() WHERE id = :id AND status = 'parsed' RETURNING id",
    { replacements: { id } },
  )) as [unknown[], unknown];
  if (claimed.length === 0)
    throw new AppError(
      "conflict",
      row.status === "committed"
        ? "This import is already committed."
        : `This import cannot be committed now (${row.status.replace("_", " ")}).`,
    );
  await row.reload();
  return row;
}

/**
 * Writes every accepted row in one transaction: all of it lands, or, on any failure, nothing does and the import
 * says why. Rows the catalogue already holds unchanged are left alone, so the same file twice changes nothing.
 */
export async function runCommit(actor: Actor, id: number, options: { writer?: ChunkWriter } = {}): Promise<void> {
  const row = (await Import.findByPk(id))!;
  try {
    const counts = await sequelize.transaction(async (transaction) => {
      // Held for as long as this commit's transaction lives: when the server dies, PostgreSQL ends the session and
      // the lock with it, which is how a retry knows at once that the commit is dead (recoverStalled).
      await sequelize.query("SELECT pg_advisory_xact_lock(:space, :id)", {
        replacements: { space: COMMIT_LOCK_SPACE, id },
        transaction,
      });
      const result = await runPass({
        importId: id,
        userId: actor.id,
        target: row.target,
        key: row.objectKey,
        shape: shapeOf(row),
        mapping: row.mapping,
        transaction,
        onProgress: progressWriter(id, "committing", row.sizeBytes),
        writer: options.writer,
      });
      await recordAudit(
        {
          actorId: actor.id,
          action: "import.commit",
          subjectType: "import",
          subjectId: id,
          after: { counts: result, target: row.target },
        },
        transaction,
      );
      return result;
    });
    await row.update({
      status: "committed",
      committedCounts: counts,
      committedAt: new Date(),
      progress: { phase: "committing", rows: counts.rows, bytes: row.sizeBytes, totalBytes: row.sizeBytes },
    });
  } catch (error) {
    console.error("[understudy] import commit failed; nothing was written", error);
    await row.update({
      status: "parsed",
      errorMessage:
        `The commit failed, so nothing was changed: ` + `${error instanceof Error ? error.message : String(error)}`,
    });
  }
}

const ROLLBACK_ORDER = ["proposals", "crosses", "part_usages", "standard_parts", "original_parts", "makers"];
const UPDATE_COLUMNS: Record<string, Record<string, string>> = {
  original_parts: {
    description: "description",
    category: "category",
    innerMm: "inner_mm",
    outerMm: "outer_mm",
    widthMm: "width_mm",
    lengthMm: "length_mm",
  },
  crosses: { fit: "fit", notes: "notes", status: "status" },
};

/** Puts back what a committed import changed and removes what it added, in one transaction. */
export async function rollbackImport(actor: Actor, id: number): Promise<{ removed: number; restored: number }> {
  const row = await loadFor(actor, id);
  if (!hasPermission(actor.role, "imports:commit")) throw new AppError("forbidden", "Only admins roll imports back.");
  const result = await sequelize.transaction(async (transaction) => {
    const [claimed] = (await sequelize.query(
      "UPDATE imports SET status = 'rolled_back', rolled_back_at = now(), " +
        "updated_at = now() WHERE id = :id AND status = 'committed' RETURNING " +
        "id",
      { replacements: { id }, transaction },
    )) as [unknown[], unknown];
    if (claimed.length === 0)
      throw new AppError(
        "conflict",
        row.status === "rolled_back"
          ? "This import is already rolled back."
          : "Only a committed import can be rolled back.",
      );
    const changes = await sequelize.query<{
      id: number;
      table_name: string;
      record_id: number;
      action: string;
      before: Record<string, unknown> | null;
    }>("SELECT id, table_name, record_id, action, before FROM import_changes WHERE import_id = :id ORDER BY id DESC", {
      replacements: { id },
      type: QueryTypes.SELECT,
      transaction,
    });
    let restored = 0;
    for (const change of changes.filter((c) => c.action === "update")) {
      const columns = UPDATE_COLUMNS[change.table_name];
      const sets = Object.keys(change.before ?? {}).filter((k) => columns?.[k]);
      if (sets.length === 0) continue;
      await sequelize.query(
        `UPDATE ${change.table_name} SET ${sets.map((k) => `${columns[k]} = :${k}`).join(", ")}, updated_at = now()
         WHERE id = :recordId`,
        {
          replacements: { ...Object.fromEntries(sets.map((k) => [k, change.before![k]])), recordId: change.record_id },
          transaction,
        },
      );
      restored += 1;
    }
    let removed = 0;
    for (const table of ROLLBACK_ORDER) {
      const ids = changes.filter((c) => c.action === "insert" && c.table_name === table).map((c) => c.record_id);
      if (ids.length === 0) continue;
      await sequelize.query(`DELETE FROM ${table} WHERE id IN (:ids)`, { replacements: { ids }, transaction });
      removed += ids.length;
    }
    await recordAudit(
      {
        actorId: actor.id,
        action: "import.rollback",
        subjectType: "import",
        subjectId: id,
        after: { removed, restored },
      },
      transaction,
    );
    return { removed, restored };
  });
  return result;
}

/**
 * Throws away an import that was never committed: its dry run, its rejected rows and the stored file. A committed
 * import stays on record (roll it back instead); one being read or committed must finish first.
 */
export async function discardImport(actor: Actor, id: number): Promise<void> {
  const row = await loadFor(actor, id);
  assertMayImport(actor, row.target);
  await recoverStalled(row);
  const [gone] = (await sequelize.query(
    "DELETE FROM imports WHERE id = :id AND status IN ('uploaded', " +
      "'parsed', 'failed') AND committed_at IS NULL RETURNING object_key",
    {
      replacements: { id },
    },
  )) as [Array<{ object_key: string }>, unknown];
  if (gone.length === 0) {
    throw new AppError(
      "conflict",
      row.status === "committed" || row.status === "rolled_back"
        ? "A committed import stays on record; roll it back to undo what it did."
        : "The file is being read or committed; wait for it to finish, then discard it.",
    );
  }
  await deleteObject(gone[0].object_key).catch(() => undefined);
  await recordAudit({
    actorId: actor.id,
    action: "import.discard",
    subjectType: "import",
    subjectId: id,
    before: { fileName: row.fileName, status: row.status },
  });
}

export interface ImportView {
  id: number;
  target: ImportTarget;
  status: ImportStatus;
  fileName: string;
  sizeBytes: number;
  encoding: string | null;
  delimiter: string | null;
  headers: string[];
  mapping: ImportMappingValue;
  missing: string[];
  counts: ImportCounts | null;
  committedCounts: ImportCounts | null;
  progress: Import["progress"];
  errorMessage: string | null;
  by: string | null;
  createdAt: string;
  committedAt: string | null;
  rolledBackAt: string | null;
  rejections: Array<{ line: number; column: string | null; reason: string }>;
  rejectionsTotal: number;
}

// Reading that has written no progress for this long was cut off (the server stopped).
const STALLED_MS = 10 * 60 * 1000;
// A commit holds an advisory lock in this space, keyed by the import's id, while its transaction runs.
const COMMIT_LOCK_SPACE = 1651;
// The moment between claiming a commit and its transaction taking the lock.
const COMMIT_START_GRACE_MS = 5_000;

/** Whether a commit's transaction is still alive: its advisory lock is held by some session. */
async function commitAlive(id: number): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const [row] = await sequelize.query<{ free: boolean }>("SELECT pg_try_advisory_xact_lock(:space, :id) AS free", {
      replacements: { space: COMMIT_LOCK_SPACE, id },
      type: QueryTypes.SELECT,
      transaction,
    });
    return !row.free;
  });
}

async function recoverStalled(row: Import): Promise<void> {
  if (!["uploaded", "parsing", "committing"].includes(row.status)) return;
  const idle = Date.now() - row.updatedAt.getTime();
  // A commit is known dead as soon as nobody holds its lock; reading has no lock and waits out the longer stall.
  const dead =
    row.status === "committing" ? idle >= COMMIT_START_GRACE_MS && !(await commitAlive(row.id)) : idle >= STALLED_MS;
  if (!dead) return;
  const message =
    row.status === "committing"
      ? "The commit was interrupted (the server stopped), so nothing was changed. Commit again."
      : "Reading the file was interrupted (the server stopped). Run the dry run again.";
  const status = row.status === "committing" ? "parsed" : "failed";
  await sequelize.query(
    "UPDATE imports SET status = :status, error_message = :message, " +
      "updated_at = now() WHERE id = :id AND status = :was",
    {
      replacements: { status, message, id: row.id, was: row.status },
    },
  );
  await row.reload();
}

export async function getImport(actor: Actor, id: number, rejectionLimit = 200): Promise<ImportView> {
  const row = await loadFor(actor, id);
  await recoverStalled(row);
  const [by] = await sequelize.query<{ email: string }>("SELECT email FROM users WHERE id = :id", {
    replacements: { id: row.userId ?? "" },
    type: QueryTypes.SELECT,
  });
  const rejections = await sequelize.query<{ line: number; column_name: string | null; reason: string }>(
    "SELECT line, column_name, reason FROM import_rejections WHERE import_id = :id ORDER BY line LIMIT :limit",
    { replacements: { id, limit: rejectionLimit }, type: QueryTypes.SELECT },
  );
  const [{ total }] = await sequelize.query<{ total: string }>(
    "SELECT count(*) AS total FROM import_rejections WHERE import_id = :id",
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return {
    id: row.id,
    target: row.target,
    status: row.status,
    fileName: row.fileName,
    sizeBytes: row.sizeBytes,
    encoding: row.encoding,
    delimiter: row.delimiter,
    headers: row.headers,
    mapping: row.mapping,
    missing: missingRequired(row.mapping),
    counts: row.counts,
    committedCounts: row.committedCounts,
    progress: row.progress,
    errorMessage: row.errorMessage,
    by: by?.email ?? null,
    createdAt: row.createdAt.toISOString(),
    committedAt: row.committedAt?.toISOString() ?? null,
    rolledBackAt: row.rolledBackAt?.toISOString() ?? null,
    rejections: rejections.map((r) => ({ line: r.line, column: r.column_name, reason: r.reason })),
    rejectionsTotal: Number(total),
  };
}

export async function recentImports(
  actor: Actor,
): Promise<
  Array<Pick<ImportView, "id" | "fileName" | "status" | "target" | "createdAt" | "by" | "counts" | "committedCounts">>
> {
  if (!hasPermission(actor.role, "imports:review-queue"))
    throw new AppError("forbidden", "Your account's role does not allow imports.");
  const rows = await sequelize.query<{
    id: number;
    file_name: string;
    status: ImportStatus;
    target: ImportTarget;
    created_at: Date;
    email: string | null;
    counts: ImportCounts | null;
    committed_counts: ImportCounts | null;
  }>(
    `SELECT i.id, i.file_name, i.status, i.target, i.created_at, u.email, i.counts, i.committed_counts
     FROM imports i LEFT JOIN users u ON u.id = i.user_id ORDER BY i.id DESC LIMIT 100`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id,
    fileName: r.file_name,
    status: r.status,
    target: r.target,
    createdAt: r.created_at.toISOString(),
    by: r.email,
    counts: r.counts,
    committedCounts: r.committed_counts,
  }));
}

/** The rejected rows as a CSV: line, column, reason, then the row as it was in the file. */
export async function rejectedCsv(actor: Actor, id: number): Promise<string> {
  const row = await loadFor(actor, id);
  const rejections = await sequelize.query<{
    line: number;
    column_name: string | null;
    reason: string;
    raw: Record<string, string>;
  }>("SELECT line, column_name, reason, raw FROM import_rejections WHERE import_id = :id ORDER BY line", {
    replacements: { id },
    type: QueryTypes.SELECT,
  });
  const fields = ["line", "column", "reason", ...row.headers.filter(Boolean)];
  return Papa.unparse(
    {
      fields,
      data: rejections.map((r) => [
        r.line,
        r.column_name ?? "",
        r.reason,
        ...row.headers.filter(Boolean).map((h) => r.raw[h] ?? ""),
      ]),
    },
    // A cell starting with = + - @ is quoted with a leading ' so that a spreadsheet does not run it as a formula.
    { newline: "\r\n", escapeFormulae: true },
  );
}

/** What a committed import wrote, row by row. */
export async function importChanges(actor: Actor, id: number, limit = 500) {
  await loadFor(actor, id);
  const rows = await sequelize.query<{ line: number; table_name: string; record_id: number; action: string }>(
    "SELECT line, table_name, record_id, action FROM import_changes WHERE " +
      "import_id = :id ORDER BY line, id LIMIT :limit",
    { replacements: { id, limit }, type: QueryTypes.SELECT },
  );
  const [{ total }] = await sequelize.query<{ total: string }>(
    "SELECT count(*) AS total FROM import_changes WHERE import_id = :id",
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return {
    changes: rows.map((r) => ({ line: r.line, table: r.table_name, recordId: r.record_id, action: r.action })),
    total: Number(total),
  };
}
