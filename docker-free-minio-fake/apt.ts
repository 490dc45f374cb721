import { spawnSync } from "node:child_process";

export const isRoot = () => process.getuid?.() === 0;

/** Installs Debian packages by name (the only outside source besides npm); refuses politely when not root. */
export function aptInstall(packages: string[], why: string, log: (message: string) => void): void {
  if (!isRoot()) {
    throw new Error(`${why} Run \`sudo apt-get install -y ${packages.join(" ")}\` and try again.`);
  }
  log(`${why} Installing Debian's ${packages.join(", ")} with apt-get…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  for (const args of [["update"], ["install", "-y", "--no-install-recommends", ...packages]]) {
    const result = spawnSync("apt-get", args, { stdio: ["ignore", "ignore", "inherit"], env });
    if (result.status !== 0) throw new Error(`apt-get ${args.join(" ")} failed (exit ${result.status}).`);
  }
}
