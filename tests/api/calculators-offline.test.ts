import { describe, expect, it } from "vitest";
import { ApiError } from "@/lib/hooks/use-api";
import { CALCULATORS } from "@/lib/measure/calculators";
import { workOutHere } from "@/lib/measure/offline";
import { send } from "../helpers/api";

// With no connection the browser works the calculators out itself (lib/measure/offline.ts). It must run the API's
// own functions: for every calculator address, the answer and the refusal worked out here are the API's, word for
// word, less the catalogue's factory parts of the size, which need the server. The sizes are everyday ones; the
// values themselves are checked against their standards in tests/unit.
const ASKED: Record<string, string[]> = {
  "/api/bearings/decode": ["designation=6205-2RS", "designation=62/22 C3", "designation=hello"],
  "/api/bearings/match": ["bore=25.03&od=61.97&width=17&unit=mm", "bore=1&od=2.4409&unit=in", "bore=abc&od=52"],
  "/api/seals/match": ["shaft=1-1/4&bore=2&width=3/8&unit=in", "shaft=35&bore=52&width=7&unit=mm&grooved=1"],
  "/api/seals/press-fit": ["bore=2.374&sealOd=2.378&unit=in", "bore=52&sealOd=52.1&outside=rubber"],
  "/api/belts/decode": ["designation=B60", "designation=5V1250", "designation=Q60"],
  "/api/belts/identify": ["top=16.3&height=13&unit=mm", "top=21/32&unit=in"],
  "/api/belts/drive": ["large=10&small=5&center=24&unit=in&section=B", "large=5&small=10&center=24"],
  "/api/felts/size": ["shaft=1.247&bore=1.75&width=0.25&unit=in", "shaft=30&bore=20&width=5"],
  "/api/packing/size": ["shaft=5/8&bore=1-1/8&depth=1&unit=in", "shaft=20&bore=18"],
  "/api/plugs/match": ["bore=1.503&unit=in&kind=cup", "bore=40&kind=round"],
  "/api/keys/woodruff": ["number=606", "number=999"],
  "/api/keys/woodruff/match": ["width=0.185&diameter=0.74&unit=in", "width=abc&diameter=0.75"],
  "/api/keys/parallel": ["shaft=1-1/2&unit=in", "shaft=25&unit=mm"],
  "/api/pins/taper": ["number=4&length=2&unit=in", "number=11"],
  "/api/pins/taper/match": ["largeEnd=8.79&length=40&unit=mm", "unit=in"],
  "/api/threads/identify": ["diameter=0.372&tpi=24&unit=in", "diameter=9.8&pitch=1.25&unit=mm"],
  "/api/chain/decode": ["number=40", "number=45"],
  "/api/chain/identify": ["pitch=12.75&roller=8.5&width=7.7&unit=mm"],
  "/api/chain/links": [
    "number=40&teeth1=15&teeth2=30&center=20&unit=in",
    "number=40&teeth1=15&teeth2=30&center=1&unit=in",
  ],
};

function hereOrRefusal(url: string): { status: number; body: unknown } {
  try {
    const { offline, ...answer } = workOutHere(url) as { offline: boolean };
    expect(offline).toBe(true);
    return { status: 200, body: answer };
  } catch (error) {
    if (!(error instanceof ApiError)) throw error;
    return { status: error.status, body: error.body };
  }
}

describe("the calculators worked out in the browser", () => {
  it("covers every calculator the API answers", () => {
    expect(Object.keys(ASKED).sort()).toEqual(Object.keys(CALCULATORS).sort());
  });

  for (const [path, queries] of Object.entries(ASKED)) {
    for (const query of queries) {
      it(`gives the API's own answer for ${path}?${query}`, async () => {
        const url = `${path}?${query}`;
        const server = await send("get", url.replace(/ /g, "%20"));
        const { catalogueParts: _parts, ...serverBody } = server.body as { catalogueParts?: unknown };
        const here = hereOrRefusal(url);
        expect(here.status).toBe(server.status);
        expect(here.body).toEqual(serverBody);
      });
    }
  }
});
