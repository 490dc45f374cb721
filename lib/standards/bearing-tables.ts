/**
 * Boundary dimensions of single-row deep groove ball bearings, d × D × B in millimetres, from ISO 15:2017 (the same
 * values as DIN 625-1). Series code = width series + diameter series: 618 (1,8), 619 (1,9), 160 (0,0 narrow), 60 (1,0),
 * 62 (0,2), 63 (0,3), 64 (0,4). Bore codes: 00 = 10, 01 = 12, 02 = 15, 03 = 17 mm, then code × 5 from 04 (20 mm) on;
 * a single digit is the bore itself (608 = 8 mm); "/22" gives the bore directly (62/22 = 22 mm).
 */
export type DeepGrooveSeries = "618" | "619" | "160" | "60" | "62" | "63" | "64";

export const SERIES_INFO: Record<DeepGrooveSeries, { name: string; dimensionSeries: string }> = {
  "618": { name: "thin section, diameter series 8", dimensionSeries: "18" },
  "619": { name: "thin section, diameter series 9", dimensionSeries: "19" },
  "160": { name: "extra-light narrow, diameter series 0", dimensionSeries: "00" },
  "60": { name: "extra-light, diameter series 0", dimensionSeries: "10" },
  "62": { name: "light, diameter series 2", dimensionSeries: "02" },
  "63": { name: "medium, diameter series 3", dimensionSeries: "03" },
  "64": { name: "heavy, diameter series 4", dimensionSeries: "04" },
};

// [bore code, d, D, B]
type Row = [string, number, number, number];

export const DEEP_GROOVE: Record<DeepGrooveSeries, Row[]> = {
  "618": [
    ["00", 10, 19, 5], ["01", 12, 21, 5], ["02", 15, 24, 5], ["03", 17, 26, 5], ["04", 20, 32, 7], ["05", 25, 37, 7],
    ["06", 30, 42, 7], ["07", 35, 47, 7], ["08", 40, 52, 7], ["09", 45, 58, 7], ["10", 50, 65, 7], ["11", 55, 72, 9],
    ["12", 60, 78, 10], ["13", 65, 85, 10], ["14", 70, 90, 10], ["15", 75, 95, 10], ["16", 80, 100, 10],
    ["17", 85, 110, 13], ["18", 90, 115, 13], ["19", 95, 120, 13], ["20", 100, 125, 13],
  ],
  "619": [
    ["00", 10, 22, 6], ["01", 12, 24, 6], ["02", 15, 28, 7], ["03", 17, 30, 7], ["04", 20, 37, 9], ["05", 25, 42, 9],
    ["06", 30, 47, 9], ["07", 35, 55, 10], ["08", 40, 62, 12], ["09", 45, 68, 12], ["10", 50, 72, 12], ["11", 55, 80, 13],
    ["12", 60, 85, 13], ["13", 65, 90, 13], ["14", 70, 100, 16], ["15", 75, 105, 16], ["16", 80, 110, 16],
    ["17", 85, 120, 18], ["18", 90, 125, 18], ["19", 95, 130, 18], ["20", 100, 140, 20],
  ],
  "160": [
    ["02", 15, 32, 8], ["03", 17, 35, 8], ["04", 20, 42, 8], ["05", 25, 47, 8], ["06", 30, 55, 9], ["07", 35, 62, 9],
    ["08", 40, 68, 9], ["09", 45, 75, 10], ["10", 50, 80, 10], ["11", 55, 90, 11], ["12", 60, 95, 11], ["13", 65, 100, 11],
    ["14", 70, 110, 13], ["15", 75, 115, 13], ["16", 80, 125, 14], ["17", 85, 130, 14], ["18", 90, 140, 16],
    ["19", 95, 145, 16], ["20", 100, 150, 16],
  ],
  "60": [
    ["4", 4, 12, 4], ["5", 5, 14, 5], ["6", 6, 17, 6], ["7", 7, 19, 6], ["8", 8, 22, 7], ["9", 9, 24, 7],
    ["00", 10, 26, 8], ["01", 12, 28, 8], ["02", 15, 32, 9], ["03", 17, 35, 10], ["04", 20, 42, 12], ["/22", 22, 44, 12],
    ["05", 25, 47, 12], ["/28", 28, 52, 12], ["06", 30, 55, 13], ["/32", 32, 58, 13], ["07", 35, 62, 14], ["08", 40, 68, 15],
    ["09", 45, 75, 16], ["10", 50, 80, 16], ["11", 55, 90, 18], ["12", 60, 95, 18], ["13", 65, 100, 18],
    ["14", 70, 110, 20], ["15", 75, 115, 20], ["16", 80, 125, 22], ["17", 85, 130, 22], ["18", 90, 140, 24],
    ["19", 95, 145, 24], ["20", 100, 150, 24],
  ],
  "62": [
    ["4", 4, 13, 5], ["5", 5, 16, 5], ["6", 6, 19, 6], ["7", 7, 22, 7], ["8", 8, 24, 8], ["9", 9, 26, 8],
    ["00", 10, 30, 9], ["01", 12, 32, 10], ["02", 15, 35, 11], ["03", 17, 40, 12], ["04", 20, 47, 14], ["/22", 22, 50, 14],
    ["05", 25, 52, 15], ["/28", 28, 58, 16], ["06", 30, 62, 16], ["/32", 32, 65, 17], ["07", 35, 72, 17], ["08", 40, 80, 18],
    ["09", 45, 85, 19], ["10", 50, 90, 20], ["11", 55, 100, 21], ["12", 60, 110, 22], ["13", 65, 120, 23],
    ["14", 70, 125, 24], ["15", 75, 130, 25], ["16", 80, 140, 26], ["17", 85, 150, 28], ["18", 90, 160, 30],
    ["19", 95, 170, 32], ["20", 100, 180, 34],
  ],
  "63": [
    ["4", 4, 16, 5], ["5", 5, 19, 6], ["6", 6, 22, 7], ["7", 7, 26, 9], ["8", 8, 28, 9], ["9", 9, 30, 10],
    ["00", 10, 35, 11], ["01", 12, 37, 12], ["02", 15, 42, 13], ["03", 17, 47, 14], ["04", 20, 52, 15], ["/22", 22, 56, 16],
    ["05", 25, 62, 17], ["/28", 28, 68, 18], ["06", 30, 72, 19], ["/32", 32, 75, 20], ["07", 35, 80, 21], ["08", 40, 90, 23],
    ["09", 45, 100, 25], ["10", 50, 110, 27], ["11", 55, 120, 29], ["12", 60, 130, 31], ["13", 65, 140, 33],
    ["14", 70, 150, 35], ["15", 75, 160, 37], ["16", 80, 170, 39], ["17", 85, 180, 41], ["18", 90, 190, 43],
    ["19", 95, 200, 45], ["20", 100, 215, 47],
  ],
  "64": [
    ["03", 17, 62, 17], ["04", 20, 72, 19], ["05", 25, 80, 21], ["06", 30, 90, 23], ["07", 35, 100, 25], ["08", 40, 110, 27],
    ["09", 45, 120, 29], ["10", 50, 130, 31], ["11", 55, 140, 33], ["12", 60, 150, 35], ["13", 65, 160, 37],
    ["14", 70, 180, 42], ["15", 75, 190, 45], ["16", 80, 200, 48], ["17", 85, 210, 52], ["18", 90, 225, 54],
    ["20", 100, 250, 58],
  ],
};

/**
 * Inch radial ball bearings of the R series (ABMA inch series): the number is the bore in sixteenths of an inch.
 * d × D × B in inches for the open bearing, then the width of the shielded or sealed one (ZZ, 2RS), which is wider for
 * several sizes. The bore rule is exact; the open rows agree with the BOSL2 open parts library's table (13 of 13);
 * the closed widths are not confirmed by an open source (BOSL2 gives the open width for its ZZ rows) and are listed
 * in docs/standards.md.
 */
export const R_SERIES: Array<[string, number, number, number, number]> = [
  ["R2", 0.125, 0.375, 0.15625, 0.15625], ["R3", 0.1875, 0.5, 0.15625, 0.196], ["R4", 0.25, 0.625, 0.196, 0.196],
  ["R6", 0.375, 0.875, 0.21875, 0.28125], ["R8", 0.5, 1.125, 0.25, 0.3125], ["R10", 0.625, 1.375, 0.28125, 0.34375],
  ["R12", 0.75, 1.625, 0.3125, 0.4375], ["R14", 0.875, 1.875, 0.375, 0.5], ["R16", 1.0, 2.0, 0.375, 0.5],
  ["R18", 1.125, 2.125, 0.375, 0.5], ["R20", 1.25, 2.25, 0.375, 0.5], ["R22", 1.375, 2.5, 0.4375, 0.5625],
  ["R24", 1.5, 2.625, 0.4375, 0.5625],
];

/**
 * Other bearing types built to the same ISO 15 dimension series share the boundary dimensions of a deep groove
 * bearing: same size is not the same part. ISO 15 dimension plan; type prefixes as commonly used.
 */
export const SAME_ENVELOPE: Partial<Record<DeepGrooveSeries, string[]>> = {
  "62": ["cylindrical roller bearings NU 2.., N 2.., NJ 2.. (dimension series 02)", "angular contact ball bearings 72.. (dimension series 02)", "self-aligning ball bearings 12.. (dimension series 02)"],
  "63": ["cylindrical roller bearings NU 3.., N 3.., NJ 3.. (dimension series 03)", "angular contact ball bearings 73.. (dimension series 03)", "self-aligning ball bearings 13.. (dimension series 03)"],
  "60": ["angular contact ball bearings 70.. (dimension series 10)", "cylindrical roller bearings NU 10.. (dimension series 10)"],
  "64": ["cylindrical roller bearings NU 4.. (dimension series 04)"],
};
