"use client";

import { ApiError, apiUrl, fetchJson, useApi as useOnlineApi } from "@/lib/hooks/use-api";
import { isConnected } from "@/lib/offline/connection";
import type { BearingCandidate, DecodedBearing } from "@/lib/standards/bearings";
import type { DecodedBelt, SectionCandidate } from "@/lib/standards/belts";
import type { SizedPart } from "@/lib/catalogue/find-by-size";
import type { FeltSize } from "@/lib/standards/felts";
import type { PackingSize } from "@/lib/standards/packing";
import type { PlugMatch } from "@/lib/standards/plugs";
import type { Chain, ChainCandidate, ChainLinks } from "@/lib/standards/chain";
import type { ParallelKeys, WoodruffCandidate, WoodruffKey } from "@/lib/standards/keys";
import type { TaperPin, TaperPinCandidate } from "@/lib/standards/pins";
import type { GREASE_FITTINGS, ThreadCandidate } from "@/lib/standards/threads";

type Params = Record<string, string | boolean | undefined>;

/**
 * Asks the API; with no connection, works the answer out on this device with the same engine functions the API runs
 * (lib/measure/calculators.ts), loaded only then. An answer worked out here says so (`offline: true`) and has no
 * catalogue parts, which need the server.
 */
async function fetchOrWorkOut<T>(url: string): Promise<T> {
  if (isConnected()) {
    try {
      return await fetchJson<T>(url);
    } catch (error) {
      if (!(error instanceof ApiError) || error.status !== 0) throw error;
    }
  }
  const { workOutHere } = await import("@/lib/measure/offline");
  return workOutHere(url) as T;
}

const useApi = <T>(url: string | null) => useOnlineApi<T>(url, {}, fetchOrWorkOut<T>);

/** The calculators' resources, one hook each; every one asks nothing until its required fields are filled in. */
export const useBearingDecode = (designation: string) =>
  useApi<DecodedBearing>(apiUrl("/api/bearings/decode", { designation }, ["designation"]));

export const useBearingMatch = (params: Params) =>
  useApi<{ candidates: BearingCandidate[]; warnings: string[]; catalogueParts: SizedPart[] }>(
    apiUrl("/api/bearings/match", params, ["bore", "od"]),
  );

export const useSealMatch = <T>(params: Params) => useApi<T>(apiUrl("/api/seals/match", params, ["shaft", "bore"]));

export const usePressFit = <T>(params: Params) => useApi<T>(apiUrl("/api/seals/press-fit", params, ["bore", "sealOd"]));

export const useBeltDecode = (designation: string) =>
  useApi<DecodedBelt>(apiUrl("/api/belts/decode", { designation }, ["designation"]));

export const useBeltSection = (params: Params) =>
  useApi<{ candidates: SectionCandidate[] }>(apiUrl("/api/belts/identify", params, ["top"]));

export const useDrive = <T>(params: Params, required: string[]) =>
  useApi<T>(apiUrl("/api/belts/drive", params, required));

export const useFeltSize = (params: Params) =>
  useApi<FeltSize & { catalogueParts: SizedPart[] }>(apiUrl("/api/felts/size", params, ["shaft", "bore", "width"]));

export const usePackingSize = (params: Params) =>
  useApi<PackingSize & { catalogueParts: SizedPart[] }>(apiUrl("/api/packing/size", params, ["shaft", "bore"]));

export const usePlugMatch = (params: Params) =>
  useApi<PlugMatch & { catalogueParts: SizedPart[] }>(apiUrl("/api/plugs/match", params, ["bore"]));

export const useWoodruffDecode = (number: string) =>
  useApi<WoodruffKey>(apiUrl("/api/keys/woodruff", { number }, ["number"]));

export const useWoodruffMatch = (params: Params) =>
  useApi<{ candidates: WoodruffCandidate[] }>(apiUrl("/api/keys/woodruff/match", params, ["width", "diameter"]));

export const useParallelKey = (params: Params) => useApi<ParallelKeys>(apiUrl("/api/keys/parallel", params, ["shaft"]));

export const useTaperPin = (params: Params) =>
  useApi<TaperPin & { notes: string[] }>(apiUrl("/api/pins/taper", params, ["number"]));

export const useTaperPinMatch = (params: Params) =>
  useApi<{ candidates: TaperPinCandidate[]; notes: string[] }>(apiUrl("/api/pins/taper/match", params, ["largeEnd"]));

export const useThreadIdentify = (params: Params, required: string[]) =>
  useApi<{ candidates: ThreadCandidate[]; greaseFittings: typeof GREASE_FITTINGS }>(
    apiUrl("/api/threads/identify", params, required),
  );

export const useChainDecode = (number: string) => useApi<Chain>(apiUrl("/api/chain/decode", { number }, ["number"]));

export const useChainIdentify = (params: Params) =>
  useApi<{ candidates: ChainCandidate[] }>(apiUrl("/api/chain/identify", params, ["pitch", "roller"]));

export const useChainLinks = (params: Params) =>
  useApi<ChainLinks>(apiUrl("/api/chain/links", params, ["number", "teeth1", "teeth2", "center"]));
