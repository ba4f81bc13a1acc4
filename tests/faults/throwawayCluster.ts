import { execFile, execFileSync } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { promisify } from "node:util";

const run = promisify(execFile);
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const isRoot = process.getuid?.() === 0;

/**
 * A private PostgreSQL cluster for tests that stop the database: the project's shared cluster is
 * never touched. It lives in a fresh folder under /tmp (owned by `postgres` when running as root,
 * since PostgreSQL refuses to run as root and the clone's parents may be closed to that user),
 * listens on 127.0.0.1 only, on a free port, and is deleted by `destroy()`.
 */
export interface ThrowawayCluster {
  port: number;
  /** Superuser URL for a database in this cluster. */
  url(database: string): string;
  stop(): Promise<void>;
  start(): Promise<void>;
  destroy(): Promise<void>;
}

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once("error", reject);
    probe.listen(0, "127.0.0.1", () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

/** Runs a server binary as the unprivileged owner; asynchronous, so the app keeps serving meanwhile. */
function asOwner(bin: string, args: string[]) {
  return isRoot ? run("runuser", ["-u", "postgres", "--", bin, ...args]) : run(bin, args);
}

export async function startThrowawayCluster(): Promise<ThrowawayCluster> {
  const bin = execFileSync("bash", [path.join(root, "scripts/db.sh"), "bin"], { encoding: "utf8" }).trim();
  const base = fs.mkdtempSync("/tmp/spanwright-fault-");
  const data = path.join(base, "data");
  const sockets = path.join(base, "run");
  const log = path.join(base, "postgres.log");
  fs.mkdirSync(sockets);
  fs.chmodSync(base, 0o755);
  if (isRoot) execFileSync("chown", ["-R", "postgres:", base]);
  const port = await freePort();
  const pgCtl = path.join(bin, "pg_ctl");

  let running = false;
  const cluster: ThrowawayCluster = {
    port,
    url: (database) => `postgres://spanwright@127.0.0.1:${port}/${database}`,
    async start() {
      await asOwner(pgCtl, ["-D", data, "-l", log, "-w", "-t", "60", "start"]);
      running = true;
    },
    async stop() {
      await asOwner(pgCtl, ["-D", data, "-m", "fast", "-w", "-t", "60", "stop"]);
      running = false;
    },
    async destroy() {
      try {
        if (running || fs.existsSync(path.join(data, "postmaster.pid"))) await asOwner(pgCtl, ["-D", data, "-m", "immediate", "-w", "stop"]);
      } catch {
        // already stopped; the folder goes either way
      }
      running = false;
      fs.rmSync(base, { recursive: true, force: true });
    },
  };
  try {
    // trust on loopback only, as the project's cluster: a disposable test server on 127.0.0.1
    await asOwner(path.join(bin, "initdb"), ["-D", data, "-U", "spanwright", "--auth=trust", "-E", "UTF8", "--no-locale", "--no-sync"]);
    fs.appendFileSync(
      path.join(data, "postgresql.conf"),
      `\nlisten_addresses = '127.0.0.1'\nport = ${port}\nunix_socket_directories = '${sockets}'\nmax_connections = 30\n`,
    );
    await cluster.start();
  } catch (error) {
    await cluster.destroy();
    throw error;
  }
  return cluster;
}
