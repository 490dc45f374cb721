/**
 * Lip seal sizes: shaft d1 × housing bore d2 × width b.
 *
 * Metric: nominal sizes of rotary shaft lip seals from ISO 6194-1 (the same list as DIN 3760), in millimetres.
 * Transcribed, not yet compared row by row with an open copy of the table (docs/standards.md lists it as unconfirmed).
 */
export const METRIC_SEALS: Array<[number, number, number]> = [
  [6, 16, 7],
  [6, 22, 7],
  [7, 22, 7],
  [8, 22, 7],
  [8, 24, 7],
  [9, 22, 7],
  [10, 22, 7],
  [10, 25, 7],
  [12, 24, 7],
  [12, 25, 7],
  [12, 30, 7],
  [15, 26, 7],
  [15, 30, 7],
  [15, 35, 7],
  [16, 30, 7],
  [18, 30, 7],
  [18, 35, 7],
  [20, 35, 7],
  [20, 40, 7],
  [22, 35, 7],
  [22, 40, 7],
  [22, 47, 7],
  [25, 40, 7],
  [25, 47, 7],
  [25, 52, 7],
  [28, 40, 7],
  [28, 47, 7],
  [28, 52, 7],
  [30, 42, 7],
  [30, 47, 7],
  [30, 52, 7],
  [32, 45, 8],
  [32, 47, 8],
  [32, 52, 8],
  [35, 50, 8],
  [35, 52, 8],
  [35, 55, 8],
  [38, 55, 8],
  [38, 58, 8],
  [38, 62, 8],
  [40, 55, 8],
  [40, 60, 8],
  [40, 62, 8],
  [42, 55, 8],
  [42, 62, 8],
  [45, 60, 8],
  [45, 62, 8],
  [45, 65, 8],
  [48, 62, 8],
  [50, 65, 8],
  [50, 68, 8],
  [50, 72, 8],
  [52, 68, 8],
  [52, 72, 8],
  [55, 70, 8],
  [55, 72, 8],
  [55, 80, 8],
  [56, 70, 8],
  [58, 72, 8],
  [58, 80, 8],
  [60, 75, 8],
  [60, 80, 8],
  [62, 85, 10],
  [63, 85, 10],
  [65, 85, 10],
  [65, 90, 10],
  [68, 90, 10],
  [70, 90, 10],
  [70, 95, 10],
  [72, 95, 10],
  [75, 95, 10],
  [75, 100, 10],
  [78, 100, 10],
  [80, 100, 10],
  [80, 110, 10],
  [85, 110, 12],
  [85, 120, 12],
  [90, 110, 12],
  [90, 120, 12],
  [95, 120, 12],
  [100, 120, 12],
  [100, 125, 12],
  [105, 130, 12],
  [110, 130, 12],
  [110, 140, 12],
  [115, 140, 12],
  [120, 150, 12],
  [125, 150, 12],
  [130, 160, 12],
  [140, 170, 15],
  [150, 180, 15],
  [160, 190, 15],
  [170, 200, 15],
  [180, 210, 15],
  [190, 220, 15],
  [200, 230, 15],
];

/**
 * Common inch lip seal sizes, shaft × bore × width in inches. Inch seals have no single published size list and are
 * made
 * for many more housing bores (in thousandths) than any table holds, so this list only names sizes nearby; the seal to
 * order is worked out from the measurement itself (sealOrder). Common practice (no published source).
 */
export const INCH_SEALS: Array<[number, number, number]> = [
  [0.5, 1.0, 0.25],
  [0.5, 1.124, 0.25],
  [0.625, 1.124, 0.25],
  [0.625, 1.25, 0.25],
  [0.75, 1.124, 0.25],
  [0.75, 1.25, 0.25],
  [0.75, 1.375, 0.25],
  [0.875, 1.375, 0.25],
  [0.875, 1.5, 0.3125],
  [1.0, 1.375, 0.25],
  [1.0, 1.5, 0.25],
  [1.0, 1.75, 0.375],
  [1.0, 1.85, 0.3125],
  [1.125, 1.5, 0.25],
  [1.125, 1.75, 0.3125],
  [1.125, 2.0, 0.375],
  [1.25, 1.75, 0.3125],
  [1.25, 2.0, 0.375],
  [1.25, 2.125, 0.375],
  [1.375, 1.875, 0.3125],
  [1.375, 2.0, 0.3125],
  [1.375, 2.25, 0.375],
  [1.5, 2.0, 0.3125],
  [1.5, 2.125, 0.375],
  [1.5, 2.25, 0.375],
  [1.625, 2.25, 0.375],
  [1.625, 2.375, 0.375],
  [1.75, 2.25, 0.3125],
  [1.75, 2.5, 0.375],
  [1.875, 2.5, 0.375],
  [1.875, 2.625, 0.375],
  [2.0, 2.5, 0.3125],
  [2.0, 2.75, 0.375],
  [2.0, 3.0, 0.5],
  [2.125, 2.875, 0.375],
  [2.25, 3.0, 0.375],
  [2.25, 3.25, 0.5],
  [2.375, 3.125, 0.375],
  [2.5, 3.25, 0.375],
  [2.5, 3.5, 0.5],
  [2.625, 3.5, 0.5],
  [2.75, 3.5, 0.5],
  [2.875, 3.625, 0.5],
  [3.0, 3.75, 0.5],
  [3.0, 4.0, 0.5],
  [3.25, 4.0, 0.5],
  [3.5, 4.25, 0.5],
  [3.75, 4.5, 0.5],
  [4.0, 4.75, 0.5],
  [4.0, 5.0, 0.5],
];

/**
 * How much larger than the nominal housing bore a metric seal's outside diameter is made, for its press fit, by bore
 * size, in millimetres: DIN 3760:1996-09 (based on ISO 6194-1), table of outside-diameter allowances. Metal-cased and
 * rubber-covered outsides differ. Confirmed row by row against two openly published seal technical tables that
 * quote DIN 3760 (docs/standards.md).
 */
export const OD_ALLOWANCE: Array<{ upToMm: number; metal: [number, number]; rubber: [number, number] }> = [
  { upToMm: 50, metal: [0.1, 0.2], rubber: [0.15, 0.3] },
  { upToMm: 80, metal: [0.13, 0.23], rubber: [0.2, 0.35] },
  { upToMm: 120, metal: [0.15, 0.25], rubber: [0.2, 0.35] },
  { upToMm: 180, metal: [0.18, 0.28], rubber: [0.25, 0.45] },
  { upToMm: 300, metal: [0.2, 0.3], rubber: [0.25, 0.45] },
  { upToMm: 500, metal: [0.23, 0.35], rubber: [0.3, 0.55] },
];

export const OD_ALLOWANCE_SOURCE = "DIN 3760:1996 (ISO 6194-1), table of seal outside-diameter allowances";

/**
 * The inch counterpart: a seal's outside diameter is the bore plus a press fit, within a tolerance either way, in
 * inches, by bore size: RMA OS-4 oil seal handbook, press-fit table. The metal-case rows and the rubber rows up to
 * 4 in are confirmed by two openly published seal technical tables; above 4 in the two disagree on rubber (0.010 and
 * 0.012 in) and the smaller figure is kept.
 */
export const INCH_PRESS_FIT: Array<{
  upToIn: number;
  metal: { fit: number; plus: number; minus: number };
  rubber: { fit: number; plus: number; minus: number };
}> = [
  { upToIn: 1, metal: { fit: 0.004, plus: 0.002, minus: 0.002 }, rubber: { fit: 0.006, plus: 0.003, minus: 0.003 } },
  { upToIn: 2, metal: { fit: 0.004, plus: 0.002, minus: 0.002 }, rubber: { fit: 0.007, plus: 0.003, minus: 0.003 } },
  { upToIn: 3, metal: { fit: 0.004, plus: 0.002, minus: 0.002 }, rubber: { fit: 0.008, plus: 0.003, minus: 0.003 } },
  { upToIn: 4, metal: { fit: 0.005, plus: 0.002, minus: 0.002 }, rubber: { fit: 0.01, plus: 0.004, minus: 0.004 } },
  { upToIn: 6, metal: { fit: 0.005, plus: 0.003, minus: 0.002 }, rubber: { fit: 0.01, plus: 0.004, minus: 0.004 } },
  { upToIn: 8, metal: { fit: 0.006, plus: 0.003, minus: 0.002 }, rubber: { fit: 0.01, plus: 0.004, minus: 0.004 } },
  { upToIn: 10, metal: { fit: 0.008, plus: 0.004, minus: 0.002 }, rubber: { fit: 0.01, plus: 0.004, minus: 0.004 } },
  { upToIn: 20, metal: { fit: 0.008, plus: 0.006, minus: 0.002 }, rubber: { fit: 0.01, plus: 0.004, minus: 0.004 } },
];

export const INCH_PRESS_FIT_SOURCE = "RMA OS-4 oil seal handbook, inch press-fit table for seal outside diameters";

/** Standard tolerance grades IT8 and IT11 in micrometres by nominal size step, from ISO 286-1:2010, Table 1. */
export const IT_GRADES: Array<{ overMm: number; upToMm: number; it8: number; it11: number }> = [
  { overMm: 0, upToMm: 3, it8: 14, it11: 60 },
  { overMm: 3, upToMm: 6, it8: 18, it11: 75 },
  { overMm: 6, upToMm: 10, it8: 22, it11: 90 },
  { overMm: 10, upToMm: 18, it8: 27, it11: 110 },
  { overMm: 18, upToMm: 30, it8: 33, it11: 130 },
  { overMm: 30, upToMm: 50, it8: 39, it11: 160 },
  { overMm: 50, upToMm: 80, it8: 46, it11: 190 },
  { overMm: 80, upToMm: 120, it8: 54, it11: 220 },
  { overMm: 120, upToMm: 180, it8: 63, it11: 250 },
  { overMm: 180, upToMm: 250, it8: 72, it11: 290 },
  { overMm: 250, upToMm: 315, it8: 81, it11: 320 },
  { overMm: 315, upToMm: 400, it8: 89, it11: 360 },
  { overMm: 400, upToMm: 500, it8: 97, it11: 400 },
];
