"use client";

import { useSyncExternalStore } from "react";
import { isConnected, subscribeConnection } from "@/lib/offline/connection";

/** Whether Understudy can be reached (lib/offline/connection.ts); true while rendering on the server. */
export function useOnline(): boolean {
  return useSyncExternalStore(subscribeConnection, isConnected, () => true);
}
