import type { ChildProcess } from "node:child_process";

/**
 * Whether a child process has ended. A child ended by a signal (the app server killed, or crashed on one) keeps
 * `exitCode` null and sets `signalCode` instead; looking at `exitCode` alone waits for it forever.
 */
export function hasExited(child: ChildProcess): boolean {
  return child.exitCode !== null || child.signalCode !== null;
}

/** Resolves with the child's exit status once it has ended (1 for an end by signal), at once if it already has. */
export function waitForExit(child: ChildProcess): Promise<number> {
  return new Promise((resolve) => {
    if (hasExited(child)) resolve(child.exitCode ?? 1);
    else child.once("exit", (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}
