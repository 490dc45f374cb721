import { QueryTypes } from "sequelize";
import { Maker, Machine, Assembly, OriginalPart, sequelize, StandardPart, Proposal, ProposalPhoto, User } from "@/db";
import { hasPermission, type Role } from "@/lib/auth/roles";
import { CATEGORY_NAMES, type Fit, type PartCategory, type StandardKind } from "@/lib/catalogue/kinds";
import {
  checkAgainstPart,
  measurementDeviations,
  PART_SIZES_FIELD,
  type MeasurementDeviation,
  type StandardDims,
} from "@/lib/proposals/checks";
import type { Measurement, ProposalCheck, ProposalStatus } from "@/lib/proposals/kinds";
import { AppError } from "@/lib/errors";

export interface ProposalRow {
  id: number;
  status: ProposalStatus;
  version: number;
  createdAt: string;
  updatedAt: string;
  partId: number | null;
  partNumber: string;
  maker: string;
  category: PartCategory;
  categoryName: string;
  standard: string;
  fit: Fit;
  photos: number;
  confirmations: number;
  warnings: number;
  moderatorMessage: string | null;
  submitter: string;
  crossId: number | null;
}

interface RawRow {
  id: number;
  status: ProposalStatus;
  version: number;
  created_at: Date;
  updated_at: Date;
  part_id: number | null;
  part_number: string;
  maker: string;
  category: PartCategory;
  standard: string;
  fit: Fit;
  photos: string;
  confirmations: string;
  warnings: number;
  moderator_message: string | null;
  submitter: string;
  cross_id: number | null;
}

// A proposal names its part either by id or, for a part new to the catalogue, in new_part; likewise its standard.
const SELECT_ROWS = `
  SELECT s.id, s.status, s.version, s.created_at, s.updated_at, s.original_part_id AS part_id,
         COALESCE(p.number, s.new_part->>'number') AS part_number,
         mk.name AS maker,
         COALESCE(p.category::text, s.new_part->>'category') AS category,
         COALESCE(sp.designation, s.new_standard->>'designation') AS standard,
         s.fit, s.moderator_message, u.email AS submitter, s.cross_id,
         (SELECT count(*) FROM proposal_photos ph WHERE ph.proposal_id = s.id) AS photos,
         (SELECT count(*) FROM confirmations c WHERE c.proposal_id = s.id) AS confirmations,
         (SELECT count(*) FROM jsonb_array_elements(s.checks) e WHERE e->>'level' = 'warning')::int AS warnings
  FROM proposals s
  JOIN users u ON u.id = s.user_id
  LEFT JOIN original_parts p ON p.id = s.original_part_id
  LEFT JOIN standard_parts sp ON sp.id = s.standard_part_id
  JOIN makers mk ON mk.id = COALESCE(p.maker_id, (s.new_part->>'makerId')::int)`;

function toRow(r: RawRow): ProposalRow {
  return {
    id: r.id,
    status: r.status,
    version: r.version,
    createdAt: r.created_at.toISOString(),
    updatedAt: r.updated_at.toISOString(),
    partId: r.part_id,
    partNumber: r.part_number,
    maker: r.maker,
    category: r.category,
    categoryName: CATEGORY_NAMES[r.category] ?? r.category,
    standard: r.standard,
    fit: r.fit,
    photos: Number(r.photos),
    confirmations: Number(r.confirmations),
    warnings: r.warnings,
    moderatorMessage: r.moderator_message,
    submitter: r.submitter,
    crossId: r.cross_id,
  };
}

export async function proposalsOf(userId: string): Promise<ProposalRow[]> {
  const rows = await sequelize.query<RawRow>(
    `${SELECT_ROWS} WHERE s.user_id = :userId ORDER BY s.updated_at DESC LIMIT 500`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return rows.map(toRow);
}

export interface QueueFilters {
  status?: ProposalStatus;
  category?: PartCategory;
  makerId?: number;
  /** Part number, designation or member's e-mail, any part of it. */
  q?: string;
  limit: number;
  offset?: number;
}

/** The review queue: oldest first, so nobody's proposal waits for ever behind newer ones. */
export async function reviewQueue(filters: QueueFilters): Promise<{ rows: ProposalRow[]; total: number }> {
  const where = ["s.status = :status"];
  if (filters.category) where.push("COALESCE(p.category::text, s.new_part->>'category') = :category");
  if (filters.makerId) where.push("mk.id = :makerId");
  if (filters.q) {
    where.push(`(COALESCE(p.number, s.new_part->>'number') ILIKE :q OR COALESCE(sp.designation,
      s.new_standard->>'designation') ILIKE :q
      OR (SELECT email FROM users WHERE id = s.user_id) ILIKE :q)`);
  }
  const replacements = {
    status: filters.status ?? "pending",
    category: filters.category ?? null,
    makerId: filters.makerId ?? null,
    q: filters.q ? `%${filters.q.replace(/[%_\\]/g, "")}%` : null,
    limit: filters.limit,
    offset: filters.offset ?? 0,
  };
  const rows = await sequelize.query<RawRow>(
    `${SELECT_ROWS} WHERE ${where.join(" AND ")} ORDER BY s.created_at, s.id LIMIT :limit OFFSET :offset`,
    { replacements, type: QueryTypes.SELECT },
  );
  const [{ total }] = await sequelize.query<{ total: string }>(
    `SELECT count(*) AS total FROM proposals s LEFT JOIN original_parts p ON p.id = s.original_part_id
     LEFT JOIN standard_parts sp ON sp.id = s.standard_part_id
     JOIN makers mk ON mk.id = COALESCE(p.maker_id, (s.new_part->>'makerId')::int) WHERE ${where.join(" AND ")}`,
    { replacements, type: QueryTypes.SELECT },
  );
  return { rows: rows.map(toRow), total: Number(total) };
}

export interface StandardView extends StandardDims {
  id: number | null;
  kind: StandardKind;
  designation: string;
  isNew: boolean;
  /** A gasket's template query, to draw it for the reviewer. */
  template: string | null;
}

export interface ProposalDetail extends ProposalRow {
  mine: boolean;
  part: {
    id: number | null;
    isNew: boolean;
    number: string;
    maker: string;
    makerId: number;
    description: string;
    category: PartCategory;
    machine: string | null;
    machineId: number | null;
    assembly: string | null;
    assemblyId: number | null;
    dims: StandardDims;
  };
  standardPart: StandardView;
  measurements: Measurement[];
  deviations: MeasurementDeviation[];
  notes: string | null;
  checks: ProposalCheck[];
  /** The proposed standard part disagrees with the worn part's documented sizes: shown first to the reviewer. */
  sizeMismatch: ProposalCheck | null;
  photoList: Array<{ id: number; url: string; fileName: string | null }>;
  existingCrosses: Array<{
    id: number;
    designation: string | null;
    repairMethod: string | null;
    fit: Fit;
    status: string;
    origin: string;
    confirmations: number;
  }>;
  submitterRecord: { approved: number; rejected: number; open: number };
  decidedAt: string | null;
}

/** One proposal with all a reviewer needs beside it; the submitter may see their own, reviewers any. */
export async function getProposalDetail(id: number, viewer: { id: string; role: Role }): Promise<ProposalDetail> {
  const [raw] = await sequelize.query<RawRow>(`${SELECT_ROWS} WHERE s.id = :id`, {
    replacements: { id },
    type: QueryTypes.SELECT,
  });
  const proposal = raw ? await Proposal.findByPk(id) : null;
  if (!raw || !proposal) throw new AppError("not_found", "There is no proposal with that id.");
  const mine = proposal.userId === viewer.id;
  if (!mine && !hasPermission(viewer.role, "proposals:review"))
    throw new AppError("not_found", "There is no proposal with that id.");
  const part = proposal.originalPartId ? await OriginalPart.findByPk(proposal.originalPartId) : null;
  const [partView, standardPart, photos, existingCrosses, submitterRecord, submitter] = await Promise.all([
    partOf(proposal, part),
    standardOf(proposal),
    ProposalPhoto.findAll({ where: { proposalId: id }, order: [["id", "ASC"]] }),
    part ? crossesOf(part.id) : [],
    recordOf(proposal.userId),
    User.findByPk(proposal.userId, { attributes: ["email"] }),
  ]);
  const partSizes = part && {
    number: part.number,
    innerMm: part.innerMm,
    outerMm: part.outerMm,
    widthMm: part.widthMm,
    lengthMm: part.lengthMm,
  };
  return {
    ...toRow(raw),
    submitter: submitter?.email ?? raw.submitter,
    mine,
    part: partView,
    standardPart,
    measurements: proposal.measurements,
    deviations: measurementDeviations(proposal.measurements, standardPart),
    notes: proposal.notes,
    checks: proposal.checks.filter((c) => c.field !== PART_SIZES_FIELD),
    // Worked out afresh, so proposals sent before the check existed are flagged too.
    sizeMismatch: partSizes ? checkAgainstPart(partSizes, standardPart) : null,
    photoList: photos.map((p) => ({ id: p.id, url: `/api/photos/${p.id}`, fileName: p.fileName })),
    existingCrosses,
    submitterRecord,
    decidedAt: proposal.decidedAt?.toISOString() ?? null,
  };
}

/** The worn part: the catalogue's, or the new one the proposal describes, with where it is fitted. */
async function partOf(proposal: Proposal, part: OriginalPart | null): Promise<ProposalDetail["part"]> {
  const makerId = part?.makerId ?? proposal.newPart!.makerId;
  const [maker, machine, assembly] = await Promise.all([
    Maker.findByPk(makerId),
    proposal.newPart?.machineId ? Machine.findByPk(proposal.newPart.machineId) : null,
    proposal.newPart?.assemblyId ? Assembly.findByPk(proposal.newPart.assemblyId) : null,
  ]);
  return {
    id: part?.id ?? null,
    isNew: !part,
    number: part?.number ?? proposal.newPart!.number,
    maker: maker?.name ?? "?",
    makerId,
    description: part?.description ?? proposal.newPart!.description,
    category: part?.category ?? proposal.newPart!.category,
    machine: machine?.model ?? null,
    machineId: machine?.id ?? null,
    assembly: assembly?.name ?? null,
    assemblyId: assembly?.id ?? null,
    dims: {
      innerMm: part?.innerMm ?? null,
      outerMm: part?.outerMm ?? null,
      widthMm: part?.widthMm ?? null,
      lengthMm: part?.lengthMm ?? null,
    },
  };
}

function templateOf(s: object): string | null {
  const attributes = (s as { attributes?: Record<string, unknown> }).attributes;
  return typeof attributes?.template === "string" ? attributes.template : null;
}

/** The standard part: the catalogue's, or the new one the proposal describes. */
async function standardOf(proposal: Proposal): Promise<StandardView> {
  const std = proposal.standardPartId ? await StandardPart.findByPk(proposal.standardPartId) : null;
  if (std) {
    const { id, kind, designation, innerMm, outerMm, widthMm, lengthMm } = std;
    const template = typeof std.attributes?.template === "string" ? std.attributes.template : null;
    return { id, kind, designation, innerMm, outerMm, widthMm, lengthMm, isNew: false, template };
  }
  const s = proposal.newStandard!;
  const size = (v: number | null | undefined) => v ?? null;
  return {
    id: null,
    kind: s.kind,
    designation: s.designation,
    innerMm: size(s.innerMm),
    outerMm: size(s.outerMm),
    widthMm: size(s.widthMm),
    lengthMm: size(s.lengthMm),
    isNew: true,
    template: templateOf(s),
  };
}

/** What the catalogue already says for the part: its crosses not rejected, with their confirmations. */
async function crossesOf(partId: number): Promise<ProposalDetail["existingCrosses"]> {
  const rows = await sequelize.query<{
    id: number;
    designation: string | null;
    repair_method: string | null;
    fit: Fit;
    status: string;
    origin: string;
    confirmations: string;
  }>(
    `SELECT c.id, sp.designation, c.repair_method, c.fit, c.status, c.origin,
            (SELECT count(*) FROM confirmations f WHERE f.cross_id = c.id) AS confirmations
     FROM crosses c LEFT JOIN standard_parts sp ON sp.id = c.standard_part_id
     WHERE c.original_part_id = :partId AND c.status <> 'rejected' ORDER BY c.status, c.fit, c.id`,
    { replacements: { partId }, type: QueryTypes.SELECT },
  );
  return rows.map((c) => ({
    id: c.id,
    designation: c.designation,
    repairMethod: c.repair_method,
    fit: c.fit,
    status: c.status,
    origin: c.origin,
    confirmations: Number(c.confirmations),
  }));
}

/** The member's record: how many of their proposals were approved, rejected, and are still open. */
async function recordOf(userId: string): Promise<ProposalDetail["submitterRecord"]> {
  const [record] = await sequelize.query<{ approved: string; rejected: string; open: string }>(
    `SELECT count(*) FILTER (WHERE status = 'approved') AS approved,
            count(*) FILTER (WHERE status = 'rejected') AS rejected,
            count(*) FILTER (WHERE status IN ('pending', 'changes_requested')) AS open
     FROM proposals WHERE user_id = :userId`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return { approved: Number(record.approved), rejected: Number(record.rejected), open: Number(record.open) };
}

/** Whether this viewer may see this photo: its uploader, a reviewer, or anyone once its proposal is approved. */
export async function photoForViewer(photoId: number, viewer: { id: string; role: Role } | null) {
  const photo = await ProposalPhoto.findByPk(photoId);
  if (!photo) return null;
  if (viewer && (photo.userId === viewer.id || hasPermission(viewer.role, "proposals:review"))) return photo;
  if (!photo.proposalId) return null;
  const proposal = await Proposal.findByPk(photo.proposalId, { attributes: ["status"] });
  return proposal?.status === "approved" ? photo : null;
}
