import { describe, expect, it } from "vitest";
import { resolveChain, type SupersessionEdge } from "@/lib/catalogue/chain";

const edge = (oldPartId: number, newPartId: number): SupersessionEdge => ({
  oldPartId,
  newPartId,
  kind: "interchangeable",
  note: null,
});

describe("supersession chains", () => {
  it("walks forward to the latest number and back to the oldest", () => {
    const chain = resolveChain(2, [edge(1, 2), edge(2, 3), edge(3, 4)]);
    expect(chain).toMatchObject({ before: [1], after: [3, 4], latestId: 4, loop: false });
    expect(chain.edges.map((e) => [e.oldPartId, e.newPartId])).toEqual([
      [1, 2],
      [2, 3],
      [3, 4],
    ]);
  });

  it("stops at a loop and says so", () => {
    const chain = resolveChain(1, [edge(1, 2), edge(2, 3), edge(3, 1)]);
    expect(chain.loop).toBe(true);
    expect(chain.after).toEqual([2, 3]);
    expect(chain.latestId).toBe(3);
  });

  it("survives a part recorded as superseding itself", () => {
    expect(resolveChain(5, [edge(5, 5)])).toMatchObject({ after: [], latestId: 5, loop: true });
  });

  it("gives a part with no records as its own latest number", () => {
    expect(resolveChain(9, [])).toMatchObject({ before: [], after: [], latestId: 9, loop: false });
  });

  it("follows one branch of a fork, the lowest id first", () => {
    expect(resolveChain(1, [edge(1, 7), edge(1, 3)]).after).toEqual([3]);
  });
});
