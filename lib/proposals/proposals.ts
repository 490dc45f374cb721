import { Op, QueryTypes, type Transaction } from "sequelize";
import {
  Assembly,
  Confirmation,
  Cross,
  Machine,
  Maker,
  OriginalPart,
  PartUsage,
  sequelize,
  StandardPart,
  Proposal,
  ProposalPhoto,
  User,
} from "@/db";
import { recordAudit } from "@/lib/audit/record";
import { searchForms } from "@/lib/catalogue/normalise";
import { checkAgainstPart, checkStandard } from "@/lib/proposals/checks";
import type { Decision, NewPartInput, NewStandardInput, ProposalCheck, ProposalStatus } from "@/lib/proposals/kinds";
import { takeTurn } from "@/lib/concurrency/take-turn";
import { checkUploadedPhotos, deleteStoredPhotos } from "@/lib/proposals/photos";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { sendMail, trySend } from "@/lib/mail/send";
import { decisionMail } from "@/lib/mail/templates";
import type { ProposalInput } from "@/lib/validation/proposals";

const HOUR_MS = 60 * 60 * 1000;
const OPEN: ProposalStatus[] = ["pending", "changes_requested"];

interface Actor {
  id: string;
  role: string;
}

interface ResolvedOriginal {
  partId: number | null;
  newPart: NewPartInput | null;
}

interface ResolvedStandard {
  standardPartId: number | null;
  newStandard: (NewStandardInput & { attributes: Record<string, unknown> }) | null;
  checks: ProposalCheck[];
}

/**
 * Adds to the standard's checks whether its sizes agree with the worn part's documented ones (existing parts only; a
 * new part has no documented sizes yet). The member saw the same check in the form before sending.
 */
async function withPartSizeCheck(original: ResolvedOriginal, standard: ResolvedStandard): Promise<ResolvedStandard> {
  if (!original.partId) return standard;
  const part = await OriginalPart.findByPk(original.partId, {
    attributes: ["number", "innerMm", "outerMm", "widthMm", "lengthMm"],
  });
  const known = standard.standardPartId ? await StandardPart.findByPk(standard.standardPartId) : null;
  const proposed = known ?? standard.newStandard;
  if (!part || !proposed) return standard;
  const check = checkAgainstPart(
    {
      number: part.number,
      innerMm: part.innerMm,
      outerMm: part.outerMm,
      widthMm: part.widthMm,
      lengthMm: part.lengthMm,
    },
    {
      kind: proposed.kind,
      designation: proposed.designation,
      innerMm: proposed.innerMm ?? null,
      outerMm: proposed.outerMm ?? null,
      widthMm: proposed.widthMm ?? null,
      lengthMm: proposed.lengthMm ?? null,
    },
  );
  return check ? { ...standard, checks: [check, ...standard.checks] } : standard;
}

async function resolveOriginal(input: ProposalInput["original"]): Promise<ResolvedOriginal> {
  if (input.mode === "existing") {
    const part = await OriginalPart.findByPk(input.partId!, { attributes: ["id"] });
    if (!part)
      throw new AppError("validation_failed", "There is no part with that id in the catalogue.", {
        field: "original.partId",
      });
    return { partId: part.id, newPart: null };
  }
  const maker = await Maker.findByPk(input.makerId!);
  if (!maker) throw new AppError("validation_failed", "There is no maker with that id.", { field: "original.makerId" });
  if (input.machineId) {
    const machine = await Machine.findByPk(input.machineId);
    if (!machine || machine.makerId !== maker.id)
      throw new AppError("validation_failed", `That machine is not one of ${maker.name}'s.`, {
        field: "original.machineId",
      });
    if (!(await Assembly.findByPk(input.assemblyId!)))
      throw new AppError("validation_failed", "There is no such place on the machine.", {
        field: "original.assemblyId",
      });
  }
  const { normalised } = searchForms(input.number!, maker.prefixes);
  if (normalised.length === 0)
    throw new AppError("validation_failed", "A factory number needs at least one letter or digit.", {
      field: "original.number",
    });
  // A "new" part the catalogue already holds is that part: the proposal is about it.
  const known = await OriginalPart.findOne({
    where: { makerId: maker.id, numberNormalised: normalised },
    attributes: ["id"],
  });
  if (known) return { partId: known.id, newPart: null };
  return {
    partId: null,
    newPart: {
      makerId: maker.id,
      number: input.number!.trim().toUpperCase(),
      description: input.description!,
      category: input.category!,
      machineId: input.machineId ?? null,
      assemblyId: input.machineId ? input.assemblyId! : null,
      numberNormalised: normalised,
    },
  };
}

async function resolveStandard(input: ProposalInput["standard"]): Promise<ResolvedStandard> {
  if (input.mode === "existing") {
    const standard = await StandardPart.findByPk(input.standardPartId!, { attributes: ["id"] });
    if (!standard)
      throw new AppError("validation_failed", "There is no standard part with that id.", {
        field: "standard.standardPartId",
      });
    return { standardPartId: standard.id, newStandard: null, checks: [] };
  }
  const checked = checkStandard({
    kind: input.kind!,
    designation: input.designation ?? "",
    innerMm: input.innerMm,
    outerMm: input.outerMm,
    widthMm: input.widthMm,
    lengthMm: input.lengthMm,
    template: input.template,
  });
  const { checks, ...standard } = checked;
  const known = await StandardPart.findOne({
    where: {
      kind: standard.kind,
      designation: sequelize.where(
        sequelize.fn("upper", sequelize.col("designation")),
        standard.designation.toUpperCase(),
      ) as never,
    },
    attributes: ["id"],
  });
  if (known) return { standardPartId: known.id, newStandard: null, checks };
  return { standardPartId: null, newStandard: standard, checks };
}

export type SubmitOutcome =
  | {
      outcome: "submitted";
      proposal: { id: number; status: ProposalStatus };
      checks: ProposalCheck[];
      photosMissing: number[];
    }
  | { outcome: "confirmed"; crossId: number; partId: number; message: string }
  | { outcome: "confirmed_pending"; proposalId: number; message: string };

/** The open or approved record this proposal repeats, if any. */
async function findDuplicate(
  original: ResolvedOriginal,
  standard: ResolvedStandard,
  excludeProposalId: number | null,
  transaction?: Transaction,
) {
  if (original.partId && standard.standardPartId) {
    const cross = await Cross.findOne({
      where: { originalPartId: original.partId, standardPartId: standard.standardPartId, status: "approved" },
      attributes: ["id"],
      transaction,
    });
    if (cross) return { kind: "cross" as const, id: cross.id };
  }
  const [row] = await sequelize.query<{ id: number; user_id: string }>(
    `SELECT id, user_id FROM proposals
     WHERE status IN ('pending', 'changes_requested') AND (:exclude::int IS NULL OR id <> :exclude)
       AND ${
         original.partId
           ? "original_part_id = :partId"
           : "new_part->>'makerId' = :makerId AND new_part->>'numberNormalised' = " + ":number"
       }
       AND ${
         standard.standardPartId
           ? "standard_part_id = :standardId"
           : "new_standard->>'kind' = :kind AND upper(new_standard->>'designation') " + "= :designation"
       }
     ORDER BY id LIMIT 1`,
    {
      replacements: {
        exclude: excludeProposalId,
        partId: original.partId,
        makerId: String(original.newPart?.makerId ?? ""),
        number: original.newPart?.numberNormalised ?? "",
        standardId: standard.standardPartId,
        kind: standard.newStandard?.kind ?? "",
        designation: standard.newStandard?.designation.toUpperCase() ?? "",
      },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return row ? { kind: "proposal" as const, id: row.id, userId: row.user_id } : null;
}

async function addConfirmation(
  target: { crossId?: number; proposalId?: number },
  userId: string,
  note: string,
  transaction?: Transaction,
): Promise<boolean> {
  const rows = await sequelize.query<{ id: number }>(
    `INSERT INTO confirmations (cross_id, proposal_id, user_id, note, created_at, updated_at)
     VALUES (:crossId, :proposalId, :userId, :note, now(), now()) ON CONFLICT DO NOTHING RETURNING id`,
    {
      replacements: {
        crossId: target.crossId ?? null,
        proposalId: target.proposalId ?? null,
        userId,
        note: note || null,
      },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return rows.length > 0;
}

/** Within the transaction that saves a proposal: the member's proposals take turns, so the count cannot be raced. */
async function assertProposalRate(userId: string, transaction: Transaction): Promise<void> {
  await takeTurn(transaction, `proposal:${userId}`);
  const recent = await Proposal.count({
    where: { userId, createdAt: { [Op.gt]: new Date(Date.now() - HOUR_MS) } },
    transaction,
  });
  if (recent >= env.PROPOSALS_PER_HOUR) {
    throw new AppError(
      "rate_limited",
      `You have sent ${env.PROPOSALS_PER_HOUR} proposals in the last hour. ` +
        `Thank you! Wait a while before sending more.`,
      { retryAfterSeconds: 3600 },
    );
  }
}

/** The columns a proposal's form fills, for a new proposal and for one changed after being sent back. */
function proposalFields(original: ResolvedOriginal, standard: ResolvedStandard, input: ProposalInput) {
  return {
    originalPartId: original.partId,
    newPart: original.newPart,
    standardPartId: standard.standardPartId,
    newStandard: standard.newStandard,
    fit: input.fit,
    measurements: input.measurements,
    notes: input.notes || null,
    checks: standard.checks,
  };
}

function snapshot(s: Proposal): Record<string, unknown> {
  return {
    status: s.status,
    version: s.version,
    originalPartId: s.originalPartId,
    newPart: s.newPart,
    standardPartId: s.standardPartId,
    newStandard: s.newStandard,
    fit: s.fit,
    measurements: s.measurements,
    notes: s.notes,
    moderatorMessage: s.moderatorMessage,
    crossId: s.crossId,
  };
}

/**
 * Saves a member's proposal as pending. One that repeats a cross already in the catalogue, or another member's open
 * proposal, becomes the member's confirmation of it instead. Photos that did not reach storage are left out and
 * listed in `photosMissing`; the text is saved regardless.
 */
export async function createProposal(user: Actor, input: ProposalInput): Promise<SubmitOutcome> {
  const original = await resolveOriginal(input.original);
  const standard = await withPartSizeCheck(original, await resolveStandard(input.standard));
  const photos = await checkUploadedPhotos(user.id, input.photoIds, null);
  return sequelize.transaction(async (transaction): Promise<SubmitOutcome> => {
    // Reports of one cross take turns, so that of two sent at once the second finds the first and becomes its
    // confirmation (or, from the same member, is refused) instead of both landing in the queue.
    await takeTurn(transaction, crossKey(original, standard));
    const duplicate = await findDuplicate(original, standard, null, transaction);
    if (duplicate?.kind === "cross") {
      const added = await addConfirmation({ crossId: duplicate.id }, user.id, input.notes, transaction);
      return {
        outcome: "confirmed",
        crossId: duplicate.id,
        partId: original.partId!,
        message: added
          ? "This cross is already in the catalogue, so your report was counted as a confirmation of it. Thank you."
          : "This cross is already in the catalogue and you have confirmed it before.",
      };
    }
    if (duplicate?.kind === "proposal") {
      if (duplicate.userId === user.id) {
        throw new AppError(
          "conflict",
          `You have already proposed this cross (proposal #${duplicate.id}); it is waiting for review.`,
          { field: "original" },
        );
      }
      const added = await addConfirmation({ proposalId: duplicate.id }, user.id, input.notes, transaction);
      return {
        outcome: "confirmed_pending",
        proposalId: duplicate.id,
        message: added
          ? "Another member has proposed the same cross and it is waiting for " +
            "review. Your report was added to it as a confirmation."
          : "Another member has proposed the same cross, and you have already confirmed it.",
      };
    }
    await assertProposalRate(user.id, transaction);
    const created = await Proposal.create(
      { userId: user.id, ...proposalFields(original, standard, input) },
      { transaction },
    );
    if (photos.usable.length > 0)
      await ProposalPhoto.update(
        { proposalId: created.id },
        { where: { id: photos.usable, userId: user.id }, transaction },
      );
    await recordAudit(
      {
        actorId: user.id,
        action: "proposal.create",
        subjectType: "proposal",
        subjectId: created.id,
        after: snapshot(created),
      },
      transaction,
    );
    return {
      outcome: "submitted",
      proposal: { id: created.id, status: created.status },
      checks: standard.checks,
      photosMissing: photos.missing,
    };
  });
}

/** What makes two reports the same cross: the worn part (or the new one's maker and number) and the standard part. */
function crossKey(original: ResolvedOriginal, standard: ResolvedStandard): string {
  const part = original.partId
    ? `p${original.partId}`
    : `n${original.newPart?.makerId}:${original.newPart?.numberNormalised}`;
  const target = standard.standardPartId
    ? `s${standard.standardPartId}`
    : `n${standard.newStandard?.kind}:${standard.newStandard?.designation.toUpperCase()}`;
  return `cross:${part}:${target}`;
}

/** The submitter changes a proposal a moderator sent back; it goes back into the queue as pending. */
export async function updateProposal(user: Actor, id: number, input: ProposalInput) {
  const existing = await Proposal.findByPk(id);
  if (!existing || existing.userId !== user.id) throw new AppError("not_found", "You have no proposal with that id.");
  if (existing.status !== "changes_requested") {
    throw new AppError(
      "conflict",
      existing.status === "pending"
        ? "This proposal is waiting for review; it can be changed only when a moderator sends it back."
        : "This proposal has been decided and can no longer be changed.",
    );
  }
  const original = await resolveOriginal(input.original);
  const standard = await withPartSizeCheck(original, await resolveStandard(input.standard));
  const duplicate = await findDuplicate(original, standard, id);
  if (duplicate?.kind === "cross")
    throw new AppError(
      "conflict",
      `That cross is already in the catalogue (cross #${duplicate.id}). ` +
        `Withdraw this proposal and confirm the cross instead.`,
      { field: "standard" },
    );
  const photos = await checkUploadedPhotos(user.id, input.photoIds, id);

  const updated = await sequelize.transaction(async (transaction) => {
    const before = snapshot(existing);
    const [count, rows] = await Proposal.update(
      {
        ...proposalFields(original, standard, input),
        status: "pending",
        version: existing.version + 1,
        digestSentAt: null,
      },
      { where: { id, status: "changes_requested", version: existing.version }, returning: true, transaction },
    );
    if (count === 0)
      throw new AppError("conflict", "This proposal changed while you were editing it. Reload the page and try again.");
    const removed = await ProposalPhoto.findAll({
      where: { proposalId: id, id: { [Op.notIn]: photos.usable.length ? photos.usable : [0] } },
      transaction,
    });
    await ProposalPhoto.destroy({ where: { id: removed.map((p) => p.id) }, transaction });
    if (photos.usable.length > 0)
      await ProposalPhoto.update({ proposalId: id }, { where: { id: photos.usable, userId: user.id }, transaction });
    await recordAudit(
      {
        actorId: user.id,
        action: "proposal.edit",
        subjectType: "proposal",
        subjectId: id,
        before,
        after: snapshot(rows[0]),
      },
      transaction,
    );
    return { row: rows[0], removedKeys: removed.map((p) => p.objectKey) };
  });
  await deleteStoredPhotos(updated.removedKeys);
  return {
    outcome: "submitted" as const,
    proposal: { id, status: updated.row.status },
    checks: standard.checks,
    photosMissing: photos.missing,
  };
}

/** A member withdraws a proposal of theirs that has not been decided. */
export async function deleteProposal(user: Actor, id: number): Promise<void> {
  const keys = await sequelize.transaction(async (transaction) => {
    const existing = await Proposal.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!existing || existing.userId !== user.id) throw new AppError("not_found", "You have no proposal with that id.");
    if (!OPEN.includes(existing.status))
      throw new AppError("conflict", "A decided proposal stays on record and cannot be withdrawn.");
    const photos = await ProposalPhoto.findAll({ where: { proposalId: id }, transaction });
    await recordAudit(
      {
        actorId: user.id,
        action: "proposal.withdraw",
        subjectType: "proposal",
        subjectId: id,
        before: snapshot(existing),
      },
      transaction,
    );
    await existing.destroy({ transaction });
    return photos.map((p) => p.objectKey);
  });
  await deleteStoredPhotos(keys);
}

const STATUS_FOR: Record<Decision, ProposalStatus> = {
  approve: "approved",
  reject: "rejected",
  request_changes: "changes_requested",
};

async function numberAndStandard(
  s: Proposal,
  transaction?: Transaction,
): Promise<{ partNumber: string; standard: string }> {
  const part = s.originalPartId
    ? await OriginalPart.findByPk(s.originalPartId, { attributes: ["number"], transaction })
    : null;
  const standard = s.standardPartId
    ? await StandardPart.findByPk(s.standardPartId, { attributes: ["designation"], transaction })
    : null;
  return {
    partNumber: part?.number ?? s.newPart?.number ?? "?",
    standard: standard?.designation ?? s.newStandard?.designation ?? "?",
  };
}

/** Puts an approved proposal into the catalogue: the part and standard part if new, and the approved cross. */
async function landInCatalogue(s: Proposal, transaction: Transaction): Promise<{ partId: number; crossId: number }> {
  // Two approvals of the same cross take turns: the second finds the part, standard part and cross the first made.
  // The database's one-approved-cross rule (migration 0006) stands behind this.
  await takeTurn(
    transaction,
    crossKey(
      { partId: s.originalPartId, newPart: s.newPart },
      { standardPartId: s.standardPartId, newStandard: s.newStandard as ResolvedStandard["newStandard"], checks: [] },
    ),
  );
  const partId = s.originalPartId ?? (await landPart(s.newPart!, transaction));
  const standardId = s.standardPartId ?? (await landStandard(s.newStandard!, transaction));
  const [cross, created] = await Cross.findOrCreate({
    where: { originalPartId: partId, standardPartId: standardId, status: "approved" },
    defaults: {
      originalPartId: partId,
      standardPartId: standardId,
      repairMethod: null,
      fit: s.fit,
      notes: s.notes,
      status: "approved",
      origin: "community",
      createdBy: s.userId,
    },
    transaction,
  });
  // Members who confirmed the proposal now confirm the cross; one who had already confirmed it keeps the older one.
  await sequelize.query(
    `UPDATE confirmations c SET cross_id = :crossId WHERE c.proposal_id = :id
       AND NOT EXISTS (SELECT 1 FROM confirmations o WHERE o.cross_id = :crossId AND o.user_id = c.user_id)`,
    { replacements: { crossId: cross.id, id: s.id }, transaction },
  );
  if (!created) await addConfirmation({ crossId: cross.id }, s.userId, "", transaction);
  await Proposal.update(
    { originalPartId: partId, standardPartId: standardId, crossId: cross.id },
    { where: { id: s.id }, transaction },
  );
  return { partId, crossId: cross.id };
}

/** The proposal's new part, added (or found, when another approval added it first), with where it is fitted. */
async function landPart(np: NonNullable<Proposal["newPart"]>, transaction: Transaction): Promise<number> {
  const maker = await Maker.findByPk(np.makerId, { transaction });
  const { normalised, key } = searchForms(np.number, maker?.prefixes ?? []);
  const [part] = await OriginalPart.findOrCreate({
    where: { makerId: np.makerId, numberNormalised: normalised },
    defaults: {
      makerId: np.makerId,
      number: np.number,
      numberNormalised: normalised,
      numberKey: key,
      description: np.description,
      category: np.category,
      innerMm: null,
      outerMm: null,
      widthMm: null,
      lengthMm: null,
      dimensionsNote: null,
    },
    transaction,
  });
  if (np.machineId && np.assemblyId) {
    const where = { partId: part.id, machineId: np.machineId, assemblyId: np.assemblyId };
    await PartUsage.findOrCreate({
      where,
      defaults: { ...where, quantity: 1, serialNote: null, position: np.description },
      transaction,
    });
  }
  return part.id;
}

/** The proposal's new standard part, added (or found). */
async function landStandard(
  newStandard: NonNullable<Proposal["newStandard"]>,
  transaction: Transaction,
): Promise<number> {
  const ns = newStandard as NewStandardInput & { attributes?: Record<string, unknown> };
  const [standard] = await StandardPart.findOrCreate({
    where: { kind: ns.kind, designation: ns.designation },
    defaults: {
      kind: ns.kind,
      designation: ns.designation,
      innerMm: ns.innerMm ?? null,
      outerMm: ns.outerMm ?? null,
      widthMm: ns.widthMm ?? null,
      lengthMm: ns.lengthMm ?? null,
      attributes: ns.attributes ?? {},
    },
    transaction,
  });
  return standard.id;
}

type DecisionInput = { action: Decision; message: string; version?: number };

/**
 * A moderator's decision. It is a conditional update on a pending row (and on its version when one is given), so
 * when two moderators decide at once exactly one wins and the other is told, with nothing written for them.
 */
export async function decide(moderator: Actor, id: number, decision: DecisionInput) {
  const current = await Proposal.findByPk(id);
  if (!current) throw new AppError("not_found", "There is no proposal with that id.");
  if (current.userId === moderator.id)
    throw new AppError("forbidden", "Another moderator must decide your own proposals.");
  if (decision.version !== undefined && decision.version !== current.version) {
    throw new AppError("conflict", "This proposal changed since you opened it. Reload it and decide again.");
  }
  const result = await recordDecision(moderator, current, decision);
  if (!result) return explainLostDecision(id);
  const mailSent = await tellSubmitter(result.proposal, decision, result.landed);
  return {
    proposal: { id, status: result.proposal.status, version: result.proposal.version },
    cross: result.landed ? { id: result.landed.crossId, partId: result.landed.partId } : null,
    mailSent,
  };
}

/** The decision, what it lands in the catalogue and its audit entry, in one transaction; null if another won. */
async function recordDecision(moderator: Actor, current: Proposal, decision: DecisionInput) {
  return sequelize.transaction(async (transaction) => {
    const [rows] = (await sequelize.query(
      `UPDATE proposals SET status = :status, version = version + 1, moderator_message = :message,
              decided_by = :moderator, decided_at = now(), updated_at = now()
       WHERE id = :id AND status = 'pending' AND version = :version RETURNING id`,
      {
        replacements: {
          status: STATUS_FOR[decision.action],
          message: decision.message || null,
          moderator: moderator.id,
          id: current.id,
          version: current.version,
        },
        transaction,
      },
    )) as [Array<{ id: number }>, unknown];
    if (rows.length === 0) return null;
    const landed = decision.action === "approve" ? await landInCatalogue(current, transaction) : null;
    const after = (await Proposal.findByPk(current.id, { transaction }))!;
    await recordAudit(
      {
        actorId: moderator.id,
        action: `proposal.${decision.action}`,
        subjectType: "proposal",
        subjectId: current.id,
        before: snapshot(current),
        after: snapshot(after),
      },
      transaction,
    );
    return { proposal: after, landed };
  });
}

/** Why a decision wrote nothing: the proposal is gone, decided by another moderator, or changed meanwhile. */
async function explainLostDecision(id: number): Promise<never> {
  const now = await Proposal.findByPk(id);
  if (!now) throw new AppError("not_found", "There is no proposal with that id.");
  if (now.status !== "pending") {
    const status = now.status.replace("_", " ");
    throw new AppError("conflict", `This proposal was already decided (${status}). Reload the queue.`);
  }
  throw new AppError("conflict", "This proposal changed since you opened it. Reload it and decide again.");
}

/**
 * The member's e-mail, unless they turned it off. Approved: straight to the part page, where the cross now shows.
 * Sent back: to the form. Rejected: the proposal itself.
 */
async function tellSubmitter(
  proposal: Proposal,
  decision: DecisionInput,
  landed: { partId: number } | null,
): Promise<boolean> {
  const submitter = await User.findByPk(proposal.userId);
  if (!submitter?.notifyByEmail) return false;
  const names = await numberAndStandard(proposal);
  const url =
    decision.action === "request_changes"
      ? `${env.APP_URL}/proposals/${proposal.id}/edit`
      : landed
        ? `${env.APP_URL}/parts/${landed.partId}`
        : `${env.APP_URL}/proposals/${proposal.id}`;
  const outcome = STATUS_FOR[decision.action] as "approved";
  return trySend(() => sendMail(decisionMail(submitter.email, { outcome, ...names, message: decision.message, url })));
}

/** A member confirms an approved cross they have fitted; once each. */
export async function confirmCross(user: Actor, crossId: number, note: string) {
  const cross = await Cross.findByPk(crossId, { attributes: ["id", "status", "originalPartId"] });
  if (!cross || cross.status !== "approved")
    throw new AppError("not_found", "There is no cross with that id in the catalogue.");
  const added = await sequelize.transaction(async (transaction) => {
    const ok = await addConfirmation({ crossId }, user.id, note, transaction);
    if (ok)
      await recordAudit(
        {
          actorId: user.id,
          action: "cross.confirm",
          subjectType: "cross",
          subjectId: crossId,
          after: { note: note || null },
        },
        transaction,
      );
    return ok;
  });
  if (!added) throw new AppError("conflict", "You have already confirmed this cross.");
  const confirmations = await Confirmation.count({ where: { crossId } });
  return { crossId, partId: cross.originalPartId, confirmations };
}
