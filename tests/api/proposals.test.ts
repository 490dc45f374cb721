import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  Assembly,
  AuditEvent,
  Confirmation,
  Cross,
  Maker,
  Machine,
  OriginalPart,
  sequelize,
  StandardPart,
  Proposal,
  ProposalPhoto,
  User,
} from "@/db";
import { sendProposalDigest } from "@/lib/proposals/digest";
import { sweepAbandonedPhotos } from "@/lib/proposals/photos";
import { headObject } from "@/lib/storage/s3";
import { send, signIn } from "../helpers/api";
import { mailCount, waitForMail, waitForMailCount } from "../helpers/mail";

afterAll(() => sequelize.close());

const MEMBER = "club.member3@understudy.test";
const OTHER = "club.member4@understudy.test";
const MODERATOR = "moderator@understudy.test";
const ADMIN = "admin@understudy.test";

let member: string;
let other: string;
let moderator: string;
let admin: string;
let makerId: number;
let bearing6205: number;

beforeAll(async () => {
  [member, other, moderator, admin] = await Promise.all([
    signIn(MEMBER),
    signIn(OTHER),
    signIn(MODERATOR),
    signIn(ADMIN),
  ]);
  makerId = (await Maker.findOne({ order: [["id", "ASC"]] }))!.id;
  const [standard] = await StandardPart.findOrCreate({
    where: { kind: "bearing", designation: "6205-2RS" },
    defaults: {
      kind: "bearing",
      designation: "6205-2RS",
      innerMm: 25,
      outerMm: 52,
      widthMm: 15,
      lengthMm: null,
      attributes: {},
    },
  });
  bearing6205 = standard.id;
});

/** A part new to the catalogue, so that each test starts from nothing. */
function newPartProposal(overrides: Record<string, unknown> = {}) {
  const number = `TST-${randomUUID().slice(0, 8).toUpperCase()}`;
  return {
    number,
    body: {
      original: { mode: "new", makerId, number, description: "Test fan shaft bearing", category: "bearing" },
      standard: { mode: "existing", standardPartId: bearing6205 },
      fit: "direct",
      measurements: [
        { dimension: "inner", value: 24.98, unit: "mm" },
        { dimension: "outer", value: 2.047, unit: "in" },
      ],
      notes: "Pressed on with a sleeve on the inner ring.",
      ...overrides,
    },
  };
}

async function submit(cookie: string, body: unknown) {
  return send("post", "/api/proposals", body, { cookie });
}

const lookup = (q: string) => send("get", `/api/parts/lookup?${new URLSearchParams({ q })}`);

describe("POST /api/proposals", () => {
  it("refuses a visitor (401) and names the field of a bad body (400)", async () => {
    expect((await submit("", newPartProposal().body)).status).toBe(401);
    const bad = await submit(member, { ...newPartProposal().body, fit: "hammered" });
    expect(bad.status).toBe(400);
    expect(bad.body.field).toBe("fit");
    const noNumber = await submit(member, { ...newPartProposal().body, original: { mode: "new", makerId } });
    expect(noNumber.status).toBe(400);
    expect(noNumber.body.fields).toHaveProperty(["original.number"]);
  });

  it("flags a bearing designation whose sizes contradict the ones entered", async () => {
    // ISO 15:2017, series 62: 6205 is 25 × 52 × 15 mm, so an entered outside diameter of 47 mm contradicts it.
    const { body, status } = await submit(
      member,
      newPartProposal({ standard: { mode: "new", kind: "bearing", designation: "6205 2rs", outerMm: 47 } }).body,
    );
    expect(status).toBe(201);
    const warnings = body.checks.filter((c: { level: string }) => c.level === "warning");
    expect(warnings).toEqual([expect.objectContaining({ field: "standard.outerMm" })]);
    expect(warnings[0].message).toContain("52 mm");
  });
});

describe("the round trip: submit, review, catalogue, mail", () => {
  it(
    "keeps a proposal out of the catalogue until a moderator approves it, " + "then shows it and tells the member",
    async () => {
      const { number, body } = newPartProposal();
      const created = await submit(member, body);
      expect(created.status).toBe(201);
      expect(created.body).toMatchObject({
        outcome: "submitted",
        proposal: { status: "pending" },
        photosMissing: [],
      });
      const id = created.body.proposal.id;

      expect((await lookup(number)).body.results).toEqual([]);
      const mine = await send("get", "/api/proposals?mine=1", undefined, { cookie: member });
      expect(mine.body.proposals.find((s: { id: number }) => s.id === id)).toMatchObject({
        status: "pending",
        partNumber: number,
        standard: "6205-2RS",
      });

      expect(
        (await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: other })).status,
      ).toBe(403);

      const queue = await send("get", "/api/proposals?category=bearing&limit=200", undefined, { cookie: moderator });
      expect(queue.status).toBe(200);
      const dates = queue.body.proposals.map((s: { createdAt: string }) => s.createdAt);
      expect(dates).toEqual([...dates].sort());
      const searched = await send("get", `/api/proposals?q=${number}`, undefined, { cookie: moderator });
      expect(searched.body).toMatchObject({
        total: 1,
        proposals: [expect.objectContaining({ id, partNumber: number })],
      });
      expect((await send("get", "/api/proposals?maker=abc", undefined, { cookie: moderator })).body.field).toBe(
        "maker",
      );

      const decided = await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator });
      expect(decided.status).toBe(200);
      expect(decided.body.proposal.status).toBe("approved");

      const found = (await lookup(number)).body.results[0];
      expect(found).toMatchObject({ number, crossCount: 1 });
      const part = await send("get", `/api/parts/${found.id}`);
      expect(part.body.crosses).toEqual([
        expect.objectContaining({
          id: decided.body.cross.id,
          fit: "direct",
          origin: "community",
          standard: expect.objectContaining({ designation: "6205-2RS" }),
        }),
      ]);

      const mail = await waitForMail(MEMBER, `Your cross is in the catalogue: ${number}`);
      expect(mail.text).toContain(`/parts/${found.id}`);
    },
  );

  it("sends a rejection with its reason, and refuses one without a reason", async () => {
    const created = await submit(member, newPartProposal().body);
    const id = created.body.proposal.id;
    const noReason = await send("post", `/api/proposals/${id}/decision`, { action: "reject" }, { cookie: moderator });
    expect(noReason.status).toBe(400);
    expect(noReason.body.field).toBe("message");
    const rejected = await send(
      "post",
      `/api/proposals/${id}/decision`,
      { action: "reject", message: "6205 is too narrow for this housing." },
      { cookie: moderator },
    );
    expect(rejected.status).toBe(200);
    const mail = await waitForMail(MEMBER, "was not accepted");
    expect(mail.text).toContain("6205 is too narrow for this housing.");
    expect(mail.text).toContain(`/proposals/${id}`);
    // The member opens their own proposal, with the moderator's message; another member cannot.
    const page = await send("get", `/proposals/${id}`, undefined, { cookie: member });
    expect(page.status).toBe(200);
    expect(page.text).toContain("6205 is too narrow for this housing.");
    expect(page.text).toContain("The moderator&#x27;s message");
    expect((await send("get", `/proposals/${id}`, undefined, { cookie: other })).status).toBe(404);
    expect(
      (await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator })).status,
    ).toBe(409);
  });

  it("sends a proposal back for changes; the member edits it and it is pending again", async () => {
    const { body } = newPartProposal();
    const id = (await submit(member, body)).body.proposal.id;
    expect((await send("patch", `/api/proposals/${id}`, body, { cookie: member })).status).toBe(409);

    const sentBack = await send(
      "post",
      `/api/proposals/${id}/decision`,
      { action: "request_changes", message: "Add the width you measured." },
      { cookie: moderator },
    );
    expect(sentBack.status).toBe(200);
    const mail = await waitForMail(MEMBER, "needs a change");
    expect(mail.text).toContain("Add the width you measured.");
    expect(mail.text).toContain(`/proposals/${id}/edit`);

    expect((await send("patch", `/api/proposals/${id}`, body, { cookie: other })).status).toBe(404);
    const edited = await send(
      "patch",
      `/api/proposals/${id}`,
      { ...body, measurements: [...body.measurements, { dimension: "width", value: 14.98, unit: "mm" }] },
      { cookie: member },
    );
    expect(edited.status).toBe(200);
    const row = await Proposal.findByPk(id);
    expect(row).toMatchObject({ status: "pending", version: 3 });
    expect(row!.measurements).toHaveLength(3);
  });

  it("lets exactly one of two simultaneous decisions win", async () => {
    const { number, body } = newPartProposal();
    const id = (await submit(member, body)).body.proposal.id;
    const [a, b] = await Promise.all([
      send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator }),
      send(
        "post",
        `/api/proposals/${id}/decision`,
        { action: "reject", message: "Duplicate of another report." },
        { cookie: admin },
      ),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const events = await AuditEvent.count({
      where: { subjectType: "proposal", subjectId: String(id), action: ["proposal.approve", "proposal.reject"] },
    });
    expect(events).toBe(1);
    const winner = a.status === 200 ? "approved" : "rejected";
    expect((await Proposal.findByPk(id))!.status).toBe(winner);
    const crosses = await sequelize.query(
      `SELECT c.id FROM crosses c JOIN original_parts p ON p.id = c.original_part_id WHERE p.number = :number`,
      { replacements: { number } },
    );
    expect(crosses[0]).toHaveLength(winner === "approved" ? 1 : 0);
  });

  it("does not let a moderator approve their own proposal", async () => {
    const id = (await submit(moderator, newPartProposal().body)).body.proposal.id;
    const own = await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator });
    expect(own.status).toBe(403);
    expect((await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: admin })).status).toBe(
      200,
    );
  });

  it("sends no decision mail to a member who turned notifications off", async () => {
    expect((await send("patch", "/api/account", { notifyByEmail: "no" }, { cookie: other })).status).toBe(400);
    expect((await send("patch", "/api/account", { notifyByEmail: false }, { cookie: other })).status).toBe(200);
    try {
      const { number, body } = newPartProposal();
      const id = (await submit(other, body)).body.proposal.id;
      const before = await mailCount(OTHER);
      const decided = await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator });
      expect(decided.body.mailSent).toBe(false);
      // A mail the member always gets (a password reset) goes after it: once that one has arrived, any decision
      // mail sent before it would have too. So the count proves the decision mail was not sent, without a fixed wait.
      await send("post", "/api/auth/password-reset/request", { email: OTHER });
      const messages = await waitForMailCount(OTHER, before + 1);
      // Newest first: what arrived since the count was taken.
      expect(messages.map((m) => m.subject).slice(0, messages.length - before)).toEqual([
        "Set a new Understudy password",
      ]);
      expect((await lookup(number)).body.results).toHaveLength(1);
    } finally {
      await send("patch", "/api/account", { notifyByEmail: true }, { cookie: other });
    }
  });
});

describe("duplicates and confirmations", () => {
  it("turns a proposal that repeats an approved cross into a confirmation, once per member", async () => {
    const { body } = newPartProposal();
    const id = (await submit(member, body)).body.proposal.id;
    const approved = await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator });
    const crossId = approved.body.cross.id;
    const partId = approved.body.cross.partId;

    const again = { ...body, original: { mode: "existing", partId } };
    const repeat = await submit(other, again);
    expect(repeat.status).toBe(200);
    expect(repeat.body).toMatchObject({ outcome: "confirmed", crossId });
    expect(await Confirmation.count({ where: { crossId } })).toBe(1);
    expect((await submit(other, again)).body.message).toContain("confirmed it before");

    const page = await send("get", `/api/parts/${partId}`);
    expect(page.body.crosses[0].confirmations).toBe(1);
  });

  it("adds a repeat of another member's open proposal to it, and refuses the same member twice", async () => {
    const { body } = newPartProposal();
    const id = (await submit(member, body)).body.proposal.id;
    expect((await submit(member, body)).status).toBe(409);
    const second = await submit(other, body);
    expect(second.body).toMatchObject({ outcome: "confirmed_pending", proposalId: id });
    const approved = await send("post", `/api/proposals/${id}/decision`, { action: "approve" }, { cookie: moderator });
    expect(await Confirmation.count({ where: { crossId: approved.body.cross.id } })).toBe(1);
  });

  it("counts a confirmation of an approved cross once; visitors cannot confirm", async () => {
    const cross = await Cross.findOne({ where: { status: "approved" }, order: [["id", "DESC"]] });
    const url = `/api/crosses/${cross!.id}/confirmations`;
    expect((await send("post", url, { note: "Fitted 2019" })).status).toBe(401);
    const first = await send("post", url, { note: "Fitted on our Pellworth, 2019." }, { cookie: admin });
    expect(first.status).toBe(201);
    expect((await send("post", url, {}, { cookie: admin })).status).toBe(409);
    expect((await send("post", "/api/crosses/999999999/confirmations", {}, { cookie: admin })).status).toBe(404);
  });
});

describe("withdrawing, rate of work and the audit log", () => {
  it("lets a member withdraw their own undecided proposal, and nobody else's", async () => {
    const id = (await submit(member, newPartProposal().body)).body.proposal.id;
    expect((await send("delete", `/api/proposals/${id}`, undefined, { cookie: other })).status).toBe(404);
    expect((await send("delete", `/api/proposals/${id}`, undefined, { cookie: member })).status).toBe(204);
    expect(await Proposal.findByPk(id)).toBeNull();
  });

  it("records each decision with who, when, before and after, for admins only", async () => {
    const id = (await submit(member, newPartProposal().body)).body.proposal.id;
    await send(
      "post",
      `/api/proposals/${id}/decision`,
      { action: "reject", message: "Not a bearing of that series." },
      { cookie: moderator },
    );
    expect((await send("get", "/api/audit", undefined, { cookie: moderator })).status).toBe(403);
    expect((await send("get", "/api/audit")).status).toBe(401);
    const { body } = await send("get", "/api/audit?limit=50", undefined, { cookie: admin });
    const event = body.events.find(
      (e: { action: string; subjectId: string }) => e.action === "proposal.reject" && e.subjectId === String(id),
    );
    expect(event).toMatchObject({
      actor: MODERATOR,
      before: { status: "pending" },
      after: { status: "rejected", moderatorMessage: "Not a bearing of that series." },
    });
    expect(Date.parse(event.at)).toBeGreaterThan(Date.now() - 60_000);
  });

  it("mails reviewers one summary of new proposals, and nothing when there are none", async () => {
    await submit(member, newPartProposal().body);
    const before = await mailCount(MODERATOR);
    const first = await sendProposalDigest();
    expect(first.proposals).toBeGreaterThan(0);
    expect(first.sent).toBe(first.recipients);
    const mail = await waitForMail(MODERATOR, "to review");
    expect(mail.text).toContain("/review");
    expect(await mailCount(MODERATOR)).toBe(before + 1);
    expect((await sendProposalDigest()).proposals).toBe(0);
  });
});

describe("POST /api/uploads/presign and photos", () => {
  it("refuses files that are not images, and images over 10 MB", async () => {
    const pdf = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "application/pdf", size: 1000 },
      { cookie: member },
    );
    expect(pdf.status).toBe(400);
    expect(pdf.body.field).toBe("contentType");
    const big = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "image/jpeg", size: 10 * 1024 * 1024 + 1 },
      { cookie: member },
    );
    expect(big.status).toBe(400);
    expect(big.body.field).toBe("size");
    expect((await send("post", "/api/uploads/presign", { contentType: "image/jpeg", size: 1000 })).status).toBe(401);
  });

  it("uploads straight to storage, keeps the photo with the proposal, and shows it to the right people", async () => {
    const bytes = Buffer.from("\xff\xd8\xff\xe0 a small test image body \xff\xd9", "latin1");
    const grant = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "image/jpeg", size: bytes.length, fileName: "bearing.jpg" },
      { cookie: member },
    );
    expect(grant.status).toBe(201);
    expect(grant.body.uploadUrl).toMatch(/photos%2F|photos\//);
    const put = await fetch(grant.body.uploadUrl, { method: "PUT", body: bytes, headers: grant.body.headers });
    expect(put.status).toBe(200);

    // A second grant that is never uploaded: the proposal is saved without it, and says so.
    const lost = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "image/png", size: 500 },
      { cookie: member },
    );
    const { body } = newPartProposal({ photoIds: [grant.body.photoId, lost.body.photoId] });
    const created = await submit(member, body);
    expect(created.status).toBe(201);
    expect(created.body.photosMissing).toEqual([lost.body.photoId]);

    const photoUrl = `/api/photos/${grant.body.photoId}`;
    const mine = await send("get", photoUrl, undefined, { cookie: member });
    expect(mine.status).toBe(200);
    expect(mine.headers["content-type"]).toBe("image/jpeg");
    expect((await send("get", photoUrl, undefined, { cookie: moderator })).status).toBe(200);
    expect((await send("get", photoUrl)).status).toBe(404);

    const detail = await send("get", `/api/proposals/${created.body.proposal.id}`, undefined, {
      cookie: moderator,
    });
    expect(detail.body.photoList).toEqual([expect.objectContaining({ id: grant.body.photoId, url: photoUrl })]);
    expect(detail.body.deviations).toEqual([
      // 2.047 in × 25.4 = 51.9938 mm against the 52 mm outside diameter of 6205 (ISO 15:2017, series 62).
      expect.objectContaining({ dimension: "inner", nominalMm: 25, deviationMm: -0.02 }),
      expect.objectContaining({ dimension: "outer", nominalMm: 52, deviationMm: -0.006 }),
    ]);
    expect((await send("get", `/api/proposals/${created.body.proposal.id}`, undefined, { cookie: other })).status).toBe(
      404,
    );

    await send(
      "post",
      `/api/proposals/${created.body.proposal.id}/decision`,
      { action: "approve" },
      { cookie: moderator },
    );
    expect((await send("get", photoUrl)).status).toBe(200);
  });

  it("deletes photos granted a day ago and never attached to a proposal, from storage too", async () => {
    const bytes = Buffer.from("\xff\xd8\xff\xe0 abandoned \xff\xd9", "latin1");
    const grant = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "image/jpeg", size: bytes.length },
      { cookie: member },
    );
    await fetch(grant.body.uploadUrl, { method: "PUT", body: bytes, headers: grant.body.headers });
    const kept = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "image/jpeg", size: 10 },
      { cookie: member },
    );
    const photo = await ProposalPhoto.findByPk(grant.body.photoId);
    await sequelize.query("UPDATE proposal_photos SET created_at = now() - interval '25 hours' WHERE id = :id", {
      replacements: { id: photo!.id },
    });
    expect(await sweepAbandonedPhotos()).toBeGreaterThanOrEqual(1);
    expect(await ProposalPhoto.findByPk(photo!.id)).toBeNull();
    expect(await headObject(photo!.objectKey)).toBeNull();
    expect(await ProposalPhoto.findByPk(kept.body.photoId)).not.toBeNull();
  });

  it("refuses a photo that another member uploaded", async () => {
    const grant = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "image/webp", size: 10 },
      { cookie: other },
    );
    const refused = await submit(member, newPartProposal({ photoIds: [grant.body.photoId] }).body);
    expect(refused.status).toBe(400);
    expect(refused.body.field).toBe("photoIds");
  });

  it("limits how many uploads a member is granted in an hour", async () => {
    const user = await User.findOne({ where: { email: "club.member8@understudy.test" } });
    const cookie = await signIn("club.member8@understudy.test");
    const statuses: number[] = [];
    for (let i = 0; i < 61; i += 1)
      statuses.push(
        (await send("post", "/api/uploads/presign", { contentType: "image/jpeg", size: 100 }, { cookie })).status,
      );
    expect(statuses.slice(0, 60).every((s) => s === 201)).toBe(true);
    expect(statuses[60]).toBe(429);
    await sequelize.query("DELETE FROM proposal_photos WHERE user_id = :id AND proposal_id IS NULL", {
      replacements: { id: user!.id },
    });
  });
});

describe("a new part with its machine", () => {
  it("puts the part on the machine when the proposal is approved", async () => {
    const machine = await Machine.findOne({ where: { makerId } });
    const { number, body } = newPartProposal();
    const withMachine = { ...body, original: { ...body.original, machineId: machine!.id } };
    const missingPlace = await submit(member, withMachine);
    expect(missingPlace.status).toBe(400);
    expect(missingPlace.body.field).toBe("original.assemblyId");
    const assembly = await Assembly.findOne({ where: { name: "Fan hub" } });
    const created = await submit(member, {
      ...withMachine,
      original: { ...withMachine.original, assemblyId: assembly!.id },
    });
    const decided = await send(
      "post",
      `/api/proposals/${created.body.proposal.id}/decision`,
      { action: "approve" },
      { cookie: moderator },
    );
    const part = await send("get", `/api/parts/${decided.body.cross.partId}`);
    expect(part.body.number).toBe(number);
    expect(part.body.whereUsed).toEqual([expect.objectContaining({ machineId: machine!.id })]);
  });
});

describe("POST /api/proposals against the worn part's documented sizes", () => {
  it("flags a 20 × 47 × 14 bearing proposed for a part documented as 15 × 35 × 11", async () => {
    // DIN 625-1 via BOLTS: 6204 is 20 × 47 × 14 mm; 15 × 35 × 11 mm is the size of 6202. The part itself is test data.
    const number = `TST-${randomUUID().slice(0, 8).toUpperCase()}`;
    const part = await OriginalPart.create({
      makerId,
      number,
      numberNormalised: number.replace(/-/g, ""),
      numberKey: number.replace(/-/g, ""),
      description: "Test water pump bearing",
      category: "bearing",
      innerMm: 15,
      outerMm: 35,
      widthMm: 11,
      lengthMm: null,
      dimensionsNote: null,
    });
    const body = {
      original: { mode: "existing", partId: part.id },
      standard: { mode: "new", kind: "bearing", designation: "6204" },
      fit: "direct",
      measurements: [],
      notes: "",
    };
    const response = await submit(member, body);
    expect(response.status).toBe(201);
    const flagged = response.body.checks.find((c: { field: string }) => c.field === "original.sizes");
    expect(flagged).toMatchObject({ level: "warning" });
    expect(flagged.message).toMatch(/15 × 35 × 11 mm/);

    const review = await send("get", `/review/${response.body.proposal.id}`, undefined, { cookie: moderator });
    expect(review.status).toBe(200);
    expect(review.text).toContain("Not the same size.");
  });
});

describe("photos checked against their grant", () => {
  it("leaves out a photo whose upload is larger, or of another type, than was granted", async () => {
    // Real S3 refuses a presigned PUT whose length or type differs from the signed ones; the local fake does not,
    // so the app checks what arrived against the grant.
    const bytes = Buffer.from("\xff\xd8\xff\xe0 a test image body that is longer than granted \xff\xd9", "latin1");
    const grant = await send(
      "post",
      "/api/uploads/presign",
      { contentType: "image/jpeg", size: 10 },
      { cookie: member },
    );
    const put = await fetch(grant.body.uploadUrl, { method: "PUT", body: bytes, headers: grant.body.headers });
    expect(put.status).toBe(200);
    const { body } = newPartProposal({ photoIds: [grant.body.photoId] });
    const created = await submit(member, body);
    expect(created.status).toBe(201);
    expect(created.body.photosMissing).toEqual([grant.body.photoId]);
  });
});

describe("hourly limits under concurrency", () => {
  it("grants no more photo uploads in an hour than the limit, however many arrive at once", async () => {
    // UPLOADS_PER_HOUR is 60 (lib/env.ts default, not overridden for tests).
    const email = "club.member1@understudy.test";
    const cookie = await signIn(email);
    const user = await User.findOne({ where: { email } });
    const already = await ProposalPhoto.count({ where: { userId: user!.id } });
    const responses = await Promise.all(
      Array.from({ length: 75 }, () =>
        send("post", "/api/uploads/presign", { contentType: "image/jpeg", size: 1000 }, { cookie }),
      ),
    );
    const granted = responses.filter((r) => r.status === 201).length;
    expect(responses.every((r) => r.status === 201 || r.status === 429)).toBe(true);
    expect(granted).toBe(Math.max(0, 60 - already));
  });
});

describe("the same cross proposed at once", () => {
  it("makes one proposal of two members' simultaneous reports, the other a confirmation of it", async () => {
    const { body } = newPartProposal();
    const [a, b] = await Promise.all([submit(member, body), submit(other, body)]);
    const outcomes = [a.body.outcome, b.body.outcome].sort();
    expect(outcomes).toEqual(["confirmed_pending", "submitted"]);
  });

  it("refuses the same member's second copy sent at the same moment", async () => {
    const { body } = newPartProposal();
    const responses = await Promise.all([submit(member, body), submit(member, body), submit(member, body)]);
    expect(responses.map((r) => r.status).sort()).toEqual([201, 409, 409]);
  });

  it("never approves two identical crosses, even when two proposals of one were both pending", async () => {
    // Two proposals of one cross that reached the queue separately (say, one by import): approving both leaves one
    // approved cross in the catalogue, the second approval counted as a confirmation.
    const { body } = newPartProposal();
    const first = await submit(member, body);
    const [part] = await sequelize.query<{ id: number }>("SELECT id FROM proposals WHERE id = :id", {
      replacements: { id: first.body.proposal.id },
      type: "SELECT" as never,
    });
    const twin = await Proposal.create({
      ...(await Proposal.findByPk(part.id))!.get({ plain: true }),
      id: undefined as never,
      userId: (await User.findOne({ where: { email: OTHER } }))!.id,
    });
    const decide = (id: number) =>
      send("post", `/api/proposals/${id}/decision`, { action: "approve", message: "" }, { cookie: moderator });
    const [x, y] = await Promise.all([decide(first.body.proposal.id), decide(twin.id)]);
    expect([x.status, y.status]).toEqual([200, 200]);
    expect(x.body.cross.id).toBe(y.body.cross.id);
    const crosses = await Cross.count({ where: { id: x.body.cross.id } });
    expect(crosses).toBe(1);
    const [{ n }] = await sequelize.query<{ n: string }>(
      "SELECT count(*) AS n FROM crosses WHERE original_part_id = :p AND standard_part_id = :s AND status = 'approved'",
      { replacements: { p: x.body.cross.partId, s: bearing6205 }, type: "SELECT" as never },
    );
    expect(Number(n)).toBe(1);
  });
});
