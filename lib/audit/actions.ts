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
