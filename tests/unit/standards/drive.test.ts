import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { adjustablePulleyRange, beltPitchLength, centreDistance, DriveError, solveDrive } from "@/lib/standards/drive";

/** The usual handbook approximation for an open belt (Machinery's Handbook, belt length; from memory). */
const handbook = (D: number, d: number, C: number) => 2 * C + 1.5708 * (D + d) + (D - d) ** 2 / (4 * C);

describe("belt pitch length", () => {
  it("works the 10 in and 5 in pulleys at 24 in centres to 71.82 in", () => {
    // Worked by hand from the exact tangent geometry: 2·√(24² − 2.5²) + π·15/2 + 5·asin(2.5/24) = 71.8225 in.
    expect(beltPitchLength(10, 5, 24)).toBeCloseTo(71.8225, 3);
  });

  it("agrees with the handbook approximation within 0.1 % for ordinary drives", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 40, noNaN: true }),
        fc.double({ min: 0.2, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 4, noNaN: true }),
        (D, ratio, spacing) => {
          const d = D * ratio;
          const C = (D + d) * spacing;
          return Math.abs(beltPitchLength(D, d, C) - handbook(D, d, C)) / handbook(D, d, C) < 0.001;
        },
      ),
    );
  });

  it("gives πD + 2C for equal pulleys", () => {
    // Geometry: with equal pulleys the belt is two half-circles and two straight spans.
    expect(beltPitchLength(6, 6, 20)).toBeCloseTo(Math.PI * 6 + 40, 10);
  });

  it("returns to the same centre distance through the length", () => {
    // Property: centre(length(C)) = C.
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 60, noNaN: true }),
        fc.double({ min: 0.1, max: 1, noNaN: true }),
        fc.double({ min: 0.6, max: 6, noNaN: true }),
        (D, ratio, spacing) => {
          const d = D * ratio;
          const C = (D + d) * spacing;
          return Math.abs(centreDistance(D, d, beltPitchLength(D, d, C)) - C) < 1e-6 * C;
        },
      ),
    );
  });

  it("refuses a belt too short to go round the pulleys", () => {
    expect(() => centreDistance(10, 5, 20)).toThrow(DriveError);
  });
});

describe("a whole drive", () => {
  it("gives span, deflection and wrap for 10 in and 5 in pulleys at 24 in", () => {
    const drive = solveDrive({ large: 10, small: 5, center: 24 });
    // Span √(24² − 2.5²) = 23.869 in; deflection 1/64 in per inch of span (common practice) = 0.373 in;
    // wrap on the small pulley 180° − 2·asin(5/48) = 168.04°.
    expect(drive.span).toBeCloseTo(23.869, 3);
    expect(drive.deflection).toBeCloseTo(0.373, 3);
    expect(drive.wrapAngleSmallDeg).toBeCloseTo(168.04, 2);
  });

  it("finds the centre distance for a given belt", () => {
    expect(solveDrive({ large: 10, small: 5, length: 71.8225 }).center).toBeCloseTo(24, 3);
  });

  it("gives the range of belt lengths an adjustable pulley covers", () => {
    const range = adjustablePulleyRange({ fixed: 8, adjustableMin: 3, adjustableMax: 4.5, center: 15 });
    expect(range.shortest).toBeCloseTo(beltPitchLength(8, 3, 15), 3);
    expect(range.longest).toBeCloseTo(beltPitchLength(8, 4.5, 15), 3);
    expect(range.longest).toBeGreaterThan(range.shortest);
  });
});
