import type { Fit, PartCategory, StandardKind } from "@/lib/catalogue/kinds";

export const PROPOSAL_STATUSES = ["pending", "changes_requested", "approved", "rejected"] as const;
export type ProposalStatus = (typeof PROPOSAL_STATUSES)[number];

export const STATUS_NAMES: Record<ProposalStatus, string> = {
  pending: "Waiting for review",
  changes_requested: "Sent back to you",
  approved: "In the catalogue",
  rejected: "Not accepted",
};

export const DECISIONS = ["approve", "reject", "request_changes"] as const;
export type Decision = (typeof DECISIONS)[number];

/** Which size a measurement is of; `other` is anything the catalogue does not compare (a lip height, a hole pitch). */
export const MEASURED_DIMENSIONS = ["inner", "outer", "width", "length", "other"] as const;
export type MeasuredDimension = (typeof MEASURED_DIMENSIONS)[number];

export const MEASURED_NAMES: Record<MeasuredDimension, string> = {
  inner: "Bore / shaft",
  outer: "Outside diameter",
  width: "Width",
  length: "Length",
  other: "Other",
};

export interface Measurement {
  dimension: MeasuredDimension;
  label?: string;
  value: number;
  unit: "mm" | "in";
}

export interface NewPartInput {
  makerId: number;
  number: string;
  description: string;
  category: PartCategory;
  machineId?: number | null;
  assemblyId?: number | null;
  /** The number as the catalogue compares it (letters and digits, maker prefix removed). */
  numberNormalised: string;
}

export interface NewStandardInput {
  kind: StandardKind;
  designation: string;
  innerMm?: number | null;
  outerMm?: number | null;
  widthMm?: number | null;
  lengthMm?: number | null;
  /** A gasket's template, as the query of `/api/gaskets/template.svg`. */
  template?: string | null;
}

/** What the standards engine found when it checked a proposal; shown to the member and to the moderator. */
export interface ProposalCheck {
  level: "ok" | "warning";
  field: string;
  message: string;
}

export type { Fit };

/** Photos: what may be uploaded, and how much. */
export const PHOTO_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type PhotoType = (typeof PHOTO_TYPES)[number];
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
export const PHOTOS_PER_PROPOSAL = 6;
