import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";

/**
 * Another app server from the same build (server.ts), on its own port, for tests that kill it or take its database
 * away without disturbing the server the other tests use. Its settings are the test run's, with `env` on top.
 */
export async function startSecondServer(
  port: number,
  env: Record<string, string> = {},
): Promise<{ url: string; process: ChildProcess; kill: () => void }> {
  const child = spawn(process.execPath, [path.resolve("node_modules/tsx/dist/cli.mjs"), "server.ts"], {
    env: { ...process.env, ...env, PORT: String(port) },
    detached: true,
    stdio: ["ignore", "ignore", process.env.SECOND_SERVER_LOG ? "inherit" : "ignore"],
  });
  const url = `http://127.0.0.1:${port}`;
  const kill = () => {
    if (child.pid && child.exitCode === null && child.signalCode === null) process.kill(-child.pid, "SIGKILL");
  };
  // Start-up on a busy two-core machine can take a minute; each probe gives up after 5 s so that a probe the
  // starting server holds open never outlasts the deadline.
  const deadline = Date.now() + 100_000;
  while (
    !(await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(5_000) })
      .then((r) => r.ok)
      .catch(() => false))
  ) {
    if (Date.now() > deadline) {
      kill();
      throw new Error(`The second app server on port ${port} did not start`);
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  return { url, process: child, kill };
}
