import { spawn } from "node:child_process";
import { describe, expect, it } from "vitest";
import { hasExited, waitForExit } from "../../docker-free-minio-fake/children";

describe("noticing that a child process has ended", () => {
  it("notices a child killed by a signal, which has no exit code", async () => {
    // The app server dying on SIGKILL (or crashing on a signal) must not leave `npm start` waiting forever.
    const child = spawn("sleep", ["30"]);
    await new Promise((resolve) => child.once("spawn", resolve));
    child.kill("SIGKILL");
    await new Promise((resolve) => child.once("exit", resolve));
    expect(child.exitCode).toBeNull();
    expect(hasExited(child)).toBe(true);
    expect(await waitForExit(child)).toBe(1);
  });

  it("gives the exit status of a child that ended by itself", async () => {
    const child = spawn("sh", ["-c", "exit 3"]);
    expect(await waitForExit(child)).toBe(3);
    expect(hasExited(child)).toBe(true);
  });
});
