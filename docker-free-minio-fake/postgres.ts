import { execFileSync, spawnSync, type SpawnSyncOptions } from "node:child_process";
import {
  chmodSync,
  chownSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
} from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import { aptInstall, isRoot } from "./apt";

/**
 * A PostgreSQL cluster of the project's own, in an ignored folder, on 127.0.0.1 only.
 * Debian's server binaries do the work; as root they run as the `postgres` system user, since initdb refuses root.
 */
export interface ClusterOptions {
  dir: string;
  databaseUrl: string;
  log: (message: string) => void;
  /** Server settings for this start (`-c name=value`), e.g. the benchmark's memory. */
  settings?: Record<string, string>;
}

interface Connection {
  user: string;
  password: string;
  host: string;
  port: number;
  database: string;
}

export class ClusterError extends Error {}

function parseUrl(databaseUrl: string): Connection {
  const url = new URL(databaseUrl);
  return {
    user: decodeURIComponent(url.username || "postgres"),
    password: decodeURIComponent(url.password),
    host: url.hostname,
    port: Number(url.port || 5432),
    database: url.pathname.replace(/^\//, "") || "postgres",
  };
}

function findBinDir(): string | null {
  const root = "/usr/lib/postgresql";
  if (existsSync(root)) {
    const versions = readdirSync(root)
      .filter((name) => existsSync(path.join(root, name, "bin", "initdb")))
      .sort((a, b) => Number(b) - Number(a));
    if (versions[0]) return path.join(root, versions[0], "bin");
  }
  const found = spawnSync("sh", ["-c", "command -v initdb"], { encoding: "utf8" }).stdout.trim();
  return found ? path.dirname(found) : null;
}

/** Installs Debian's postgresql package when its server binaries are missing. */
export function ensurePostgresInstalled(log: (message: string) => void): string {
  const existing = findBinDir();
  if (existing) return existing;
  if (isRoot()) {
    // The project runs its own cluster; Debian's default "main" cluster on port 5432 is not wanted.
    // createcluster.conf includes this folder whether or not the file itself exists yet.
    const confDir = "/etc/postgresql-common/createcluster.d";
    mkdirSync(confDir, { recursive: true });
    writeFileSync(`${confDir}/understudy.conf`, "create_main_cluster = false\n");
  }
  aptInstall(["postgresql"], "PostgreSQL's server programs are not installed.", log);
  const installed = findBinDir();
  if (!installed) throw new ClusterError("The postgresql package installed, but initdb was not found.");
  return installed;
}

function postgresIds(): { uid: number; gid: number } {
  const id = (flag: string) => Number(execFileSync("id", [flag, "postgres"], { encoding: "utf8" }).trim());
  try {
    return { uid: id("-u"), gid: id("-g") };
  } catch {
    execFileSync("useradd", ["--system", "--no-create-home", "--shell", "/usr/sbin/nologin", "postgres"]);
    return { uid: id("-u"), gid: id("-g") };
  }
}

/** Runs a server program as the cluster's owner: `postgres` under root, the current user otherwise. */
function runAsOwner(bin: string, args: string[], options: SpawnSyncOptions = {}) {
  const [command, fullArgs] = isRoot() ? ["runuser", ["-u", "postgres", "--", bin, ...args]] : [bin, args];
  // A working directory the postgres user can read, so that it does not complain about the caller's.
  return spawnSync(command, fullArgs, { cwd: "/", encoding: "utf8", ...options });
}

function giveToOwner(target: string): void {
  if (!isRoot()) return;
  const { uid, gid } = postgresIds();
  chownSync(target, uid, gid);
}

/** Every folder above the cluster must be traversable by the postgres user, or the server cannot reach its data. */
function assertTraversable(dir: string): void {
  if (!isRoot()) return;
  for (let current = path.dirname(dir); current !== path.dirname(current); current = path.dirname(current)) {
    const mode = statSync(current).mode;
    if ((mode & 0o001) === 0) {
      throw new ClusterError(
        `The postgres user cannot enter ${current} (mode ` +
          `${(mode & 0o777).toString(8)}). Run \`chmod o+x ${current}\` or move ` +
          `the checkout.`,
      );
    }
  }
}

function portInUse(port: number, host: string): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host });
    socket.setTimeout(1_000);
    socket.once("connect", () => (socket.destroy(), resolve(true)));
    socket.once("timeout", () => (socket.destroy(), resolve(false)));
    socket.once("error", () => resolve(false));
  });
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === "EPERM";
  }
}

export class PostgresCluster {
  private readonly dir: string;
  private readonly conn: Connection;
  private readonly log: (message: string) => void;
  private readonly settings: Record<string, string>;
  private binDir = "";
  private startedHere = false;

  constructor(options: ClusterOptions) {
    this.dir = path.resolve(options.dir);
    this.conn = parseUrl(options.databaseUrl);
    this.log = options.log;
    this.settings = options.settings ?? {};
  }

  private bin(name: string): string {
    return path.join(this.binDir, name);
  }

  private get socketDir(): string {
    return path.join(path.dirname(this.dir), "pg-socket");
  }

  private get logFile(): string {
    return path.join(path.dirname(this.dir), "postgres.log");
  }

  private isRunning(): boolean {
    return (
      existsSync(path.join(this.dir, "PG_VERSION")) &&
      runAsOwner(this.bin("pg_ctl"), ["status", "-D", this.dir]).status === 0
    );
  }

  private init(): void {
    if (existsSync(path.join(this.dir, "PG_VERSION"))) return;
    this.log(`creating a PostgreSQL cluster in ${path.relative(process.cwd(), this.dir) || this.dir}`);
    mkdirSync(this.dir, { recursive: true });
    chmodSync(path.dirname(this.dir), 0o755);
    chmodSync(this.dir, 0o700);
    giveToOwner(this.dir);
    assertTraversable(this.dir);
    const pwfile = path.join(os.tmpdir(), `understudy-pw-${process.pid}`);
    writeFileSync(pwfile, `${this.conn.password}\n`, { mode: 0o600 });
    giveToOwner(pwfile);
    try {
      const result = runAsOwner(this.bin("initdb"), [
        "-D",
        this.dir,
        "-U",
        this.conn.user,
        `--pwfile=${pwfile}`,
        "--auth-host=scram-sha-256",
        "--auth-local=peer",
        "--encoding=UTF8",
        "--locale=C",
      ]);
      if (result.status !== 0) throw new ClusterError(`initdb failed:\n${result.stderr || result.stdout}`);
    } finally {
      rmSync(pwfile, { force: true });
    }
  }

  async start(): Promise<void> {
    this.binDir = ensurePostgresInstalled(this.log);
    this.init();
    if (this.isRunning()) {
      this.log(`PostgreSQL already running on 127.0.0.1:${this.conn.port}; reusing it`);
    } else {
      const pidFile = path.join(this.dir, "postmaster.pid");
      if (existsSync(pidFile)) {
        const pid = Number(readFileSync(pidFile, "utf8").split("\n")[0]);
        if (pid && processAlive(pid)) {
          throw new ClusterError(
            `A PostgreSQL process (pid ${pid}) holds ${this.dir} but does not answer. Stop it and start again.`,
          );
        }
        this.log(`removing a stale pid file (pid ${pid} is gone; PostgreSQL did not stop cleanly last time)`);
        rmSync(pidFile);
      }
      if (await portInUse(this.conn.port, "127.0.0.1")) {
        throw new ClusterError(
          `Port ${this.conn.port} on 127.0.0.1 is already taken by another ` +
            `program. Stop it, or choose another port in DATABASE_URL.`,
        );
      }
      mkdirSync(this.socketDir, { recursive: true });
      giveToOwner(this.socketDir);
      if (!existsSync(this.logFile)) writeFileSync(this.logFile, "");
      giveToOwner(this.logFile);
      const settings = Object.entries(this.settings).map(([name, value]) => ` -c ${name}=${value}`);
      const options = `-c listen_addresses=127.0.0.1 -p ${this.conn.port} -k ${this.socketDir}${settings.join("")}`;
      const result = runAsOwner(this.bin("pg_ctl"), [
        "start",
        "-D",
        this.dir,
        "-l",
        this.logFile,
        "-w",
        "-t",
        "60",
        "-o",
        options,
      ]);
      if (result.status !== 0) {
        throw new ClusterError(`PostgreSQL did not start (see ${this.logFile}):\n${result.stderr || result.stdout}`);
      }
      this.startedHere = true;
      this.log(`PostgreSQL started on 127.0.0.1:${this.conn.port}`);
    }
    await this.ensureDatabase(this.conn.database);
  }

  /** Creates a database on this cluster when it does not exist yet. */
  async ensureDatabase(name: string): Promise<void> {
    const client = new pg.Client({ ...this.conn, host: "127.0.0.1", database: "postgres" });
    await client.connect();
    try {
      const found = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [name]);
      if (found.rowCount === 0) {
        await client.query(`CREATE DATABASE "${name.replace(/"/g, '""')}"`);
        this.log(`database ${name} created`);
      }
    } finally {
      await client.end();
    }
  }

  /**
   * A streaming read replica of this cluster, as a managed PostgreSQL's replica would be: a base backup taken with
   * `pg_basebackup -R` into `dir` (thrown away first), started on `port` in standby mode. It follows every change
   * the primary commits. Returns the replica's address, and its stop.
   */
  async startReplica(dir: string, port: number): Promise<{ url: string; stop: () => void }> {
    const target = path.resolve(dir);
    const replicaSockets = path.join(path.dirname(target), "pg-replica-socket");
    rmSync(target, { recursive: true, force: true });
    mkdirSync(path.dirname(target), { recursive: true });
    mkdirSync(replicaSockets, { recursive: true });
    giveToOwner(path.dirname(target));
    giveToOwner(replicaSockets);
    const backup = runAsOwner(
      this.bin("pg_basebackup"),
      ["-D", target, "-R", "-X", "stream", "-h", "127.0.0.1", "-p", String(this.conn.port), "-U", this.conn.user],
      { env: { ...process.env, PGPASSWORD: this.conn.password } },
    );
    if (backup.status !== 0) throw new ClusterError(`pg_basebackup failed:\n${backup.stderr || backup.stdout}`);
    const log = path.join(path.dirname(target), "replica.log");
    writeFileSync(log, "");
    giveToOwner(log);
    const options = `-c listen_addresses=127.0.0.1 -p ${port} -k ${replicaSockets}`;
    const started = runAsOwner(this.bin("pg_ctl"), ["start", "-D", target, "-l", log, "-w", "-t", "60", "-o", options]);
    if (started.status !== 0) throw new ClusterError(`The replica did not start (see ${log})`);
    this.log(`PostgreSQL read replica (streaming from ${this.conn.port}) on 127.0.0.1:${port}`);
    const url = new URL(`postgres://127.0.0.1:${port}/${this.conn.database}`);
    url.username = this.conn.user;
    url.password = this.conn.password;
    return {
      url: url.toString(),
      stop: () => void runAsOwner(this.bin("pg_ctl"), ["stop", "-D", target, "-m", "fast", "-w"]),
    };
  }

  /** Stops the server if this process started it (or always, with force). */
  stop(force = false): void {
    if (force) this.binDir ||= ensurePostgresInstalled(this.log);
    if (!this.binDir || (!this.startedHere && !force) || !this.isRunning()) return;
    runAsOwner(this.bin("pg_ctl"), ["stop", "-D", this.dir, "-m", "fast", "-w"]);
    this.startedHere = false;
  }
}
