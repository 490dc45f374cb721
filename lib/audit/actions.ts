/** Every kind of entry the audit log keeps, in the words an admin reads on /audit. */
export const AUDIT_ACTIONS = {
  "proposal.create": "Proposed a cross",
  "proposal.edit": "Changed a proposal",
  "proposal.withdraw": "Withdrew a proposal",
  "proposal.approve": "Approved a proposal",
  "proposal.reject": "Rejected a proposal",
  "proposal.request_changes": "Sent a proposal back for changes",
  "cross.confirm": "Confirmed a cross",
  "import.upload": "Uploaded an import",
  "import.commit": "Committed an import",
  "import.rollback": "Rolled back an import",
  "import.discard": "Discarded an import that was never committed",
  "list.share": "Shared a job list by link",
  "list.unshare": "Stopped sharing a job list",
  "account.notifications": "Changed their e-mail notices",
  "account.role": "Changed an account's role",
} as const;

export type AuditAction = keyof typeof AUDIT_ACTIONS;

/** The kinds of record an entry is about. */
export const AUDIT_SUBJECTS = {
  proposal: "proposal",
  cross: "cross",
  import: "import",
  job_list: "job list",
  user: "account",
} as const;

export type AuditSubject = keyof typeof AUDIT_SUBJECTS;

export function auditActionWords(action: string): string {
  return (AUDIT_ACTIONS as Record<string, string>)[action] ?? action;
}

export function auditSubjectWords(subjectType: string): string {
  return (AUDIT_SUBJECTS as Record<string, string>)[subjectType] ?? subjectType;
}

/** Names of recorded fields in an admin's words; a field not listed is spelled out from its name. */
const FIELD_WORDS: Record<string, string> = {
  status: "the status",
  role: "the role",
  fit: "the fit",
  notes: "the notes",
  reason: "the reason",
  title: "the title",
  shareToken: "the sharing link",
  shared: "sharing",
  emailNotifications: "e-mail notices",
  notifyByEmail: "e-mail notices",
  standardPartId: "the standard part",
  originalPartId: "the part",
  quantity: "the quantity",
  fileName: "the file",
  counts: "the counts",
};

function fieldWords(key: string): string {
  return (
    FIELD_WORDS[key] ??
    `the ${key
      .replace(/([a-z])([A-Z])/g, "$1 $2")
      .replace(/_/g, " ")
      .toLowerCase()}`
  );
}

function valueWords(value: unknown): string {
  if (value === null || value === undefined || value === "") return "nothing";
  if (typeof value === "boolean") return value ? "on" : "off";
  if (typeof value === "string") return value.replace(/_/g, " ");
  if (typeof value === "number") return String(value);
  if (Array.isArray(value)) return `${value.length} item${value.length === 1 ? "" : "s"}`;
  return "a record";
}

/**
 * What an entry changed, in plain words: "changed the role from member to moderator; changed the notes". Never field
 * names or raw values: long texts are named, not quoted.
 */
export function auditChangeWords(
  before: Record<string, unknown> | null,
  after: Record<string, unknown> | null,
): string {
  if (!before && !after) return "";
  if (!after) return "removed it";
  const show = (v: unknown) => (typeof v === "string" && v.length > 40 ? null : valueWords(v));
  if (!before)
    return Object.entries(after)
      .slice(0, 4)
      .map(([k, v]) => (show(v) ? `${fieldWords(k)} ${show(v)}` : `with ${fieldWords(k)}`))
      .join("; ");
  return Object.keys({ ...before, ...after })
    .filter((k) => JSON.stringify(before[k]) !== JSON.stringify(after[k]))
    .map((k) => {
      const from = show(before[k]);
      const to = show(after[k]);
      return from && to ? `changed ${fieldWords(k)} from ${from} to ${to}` : `changed ${fieldWords(k)}`;
    })
    .join("; ");
}
