export const PART_CATEGORIES = [
  "bearing",
  "lip_seal",
  "felt_seal",
  "v_belt",
  "key",
  "gasket",
  "plug",
  "other",
  "packing",
  "pin",
  "fastener",
  "grease_fitting",
  "chain",
] as const;
export type PartCategory = (typeof PART_CATEGORIES)[number];

export const STANDARD_KINDS = [
  "bearing",
  "lip_seal",
  "v_belt",
  "key",
  "plug",
  "felt",
  "sleeve",
  "gasket_sheet",
  "packing",
  "gasket",
  "pin",
  "thread",
  "grease_fitting",
  "chain",
] as const;
export type StandardKind = (typeof STANDARD_KINDS)[number];

/** Best first: the order crosses are ranked in. */
export const FITS = ["direct", "with_modification", "dimensions_only"] as const;
export type Fit = (typeof FITS)[number];

export const CROSS_STATUSES = ["approved", "pending", "rejected"] as const;
export type CrossStatus = (typeof CROSS_STATUSES)[number];

export const CROSS_ORIGINS = ["editor", "import", "community"] as const;
export type CrossOrigin = (typeof CROSS_ORIGINS)[number];

export const SUPERSESSION_KINDS = ["interchangeable", "one_way", "with_companions"] as const;
export type SupersessionKind = (typeof SUPERSESSION_KINDS)[number];

export const MACHINE_KINDS = ["tractor", "crawler", "engine"] as const;
export type MachineKind = (typeof MACHINE_KINDS)[number];

/** The kinds of work that carry a caution on screen. */
export type CautionKind =
  "bearings" | "belts" | "coolant" | "seals" | "drivers" | "glands" | "gaskets" | "chains" | "grease";

/** The caution each kind of part's work carries, on its part page and on a job list that holds it. */
export const CAUTION_FOR_CATEGORY: Partial<Record<PartCategory, CautionKind>> = {
  bearing: "bearings",
  v_belt: "belts",
  lip_seal: "seals",
  felt_seal: "seals",
  gasket: "gaskets",
  packing: "glands",
  plug: "drivers",
  key: "drivers",
  pin: "drivers",
  chain: "chains",
  grease_fitting: "grease",
};

export const CATEGORY_NAMES: Record<PartCategory, string> = {
  bearing: "Ball bearing",
  lip_seal: "Lip seal",
  felt_seal: "Felt seal",
  v_belt: "V-belt",
  key: "Key",
  gasket: "Gasket",
  plug: "Plug",
  other: "Other",
  packing: "Gland packing",
  pin: "Pin",
  fastener: "Bolt, stud or nut",
  grease_fitting: "Grease fitting",
  chain: "Roller chain",
};

export const FIT_NAMES: Record<Fit, { word: string; mark: string; text: string }> = {
  direct: { word: "Direct", mark: "●", text: "same size and type; fits as the old part did" },
  with_modification: { word: "With modification", mark: "◐", text: "fits after the change described in the notes" },
  dimensions_only: { word: "Dimensions only", mark: "○", text: "the sizes agree; nobody has reported fitting it yet" },
};

export const STANDARD_KIND_NAMES: Record<StandardKind, string> = {
  bearing: "Ball bearing",
  lip_seal: "Lip seal",
  v_belt: "V-belt",
  key: "Key",
  plug: "Plug",
  felt: "Felt",
  sleeve: "Shaft repair sleeve",
  gasket_sheet: "Gasket sheet",
  packing: "Gland packing",
  gasket: "Gasket (cut to a template)",
  pin: "Taper or straight pin",
  thread: "Bolt, stud or nut (by thread)",
  grease_fitting: "Grease fitting",
  chain: "Roller chain",
};
