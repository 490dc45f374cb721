import { describe, expect, it } from "vitest";
import { auditActionWords, auditChangeWords } from "@/lib/audit/actions";

describe("the audit log in plain words", () => {
  it("says what changed, never field names or raw values", () => {
    expect(auditChangeWords({ role: "member" }, { role: "moderator" })).toBe(
      "changed the role from member to moderator",
    );
    expect(auditChangeWords({ status: "pending" }, { status: "changes_requested" })).toBe(
      "changed the status from pending to changes requested",
    );
    expect(auditChangeWords({ notes: "x".repeat(200) }, { notes: "y" })).toBe("changed the notes");
    expect(auditChangeWords({ emailNotifications: true }, { emailNotifications: false })).toBe(
      "changed e-mail notices from on to off",
    );
    expect(auditChangeWords({ role: "member" }, null)).toBe("removed it");
    expect(auditChangeWords(null, { fileName: "club.csv" })).toBe("the file club.csv");
    expect(auditChangeWords({ sourceRowCount: 1 }, { sourceRowCount: 2 })).toBe(
      "changed the source row count from 1 to 2",
    );
    expect(auditActionWords("proposal.approve")).toBe("Approved a proposal");
  });
});
