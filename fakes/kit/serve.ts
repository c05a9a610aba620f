// Starts a fake's HTTP server, lets it go down on purpose for tests, and stops it cleanly.
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";

export type OutageMode = "none" | "unavailable" | "refuse";

export interface RunningServer {
  readonly server: Server;
  readonly port: number;
  /** Base URL on 127.0.0.1, e.g. http://127.0.0.1:3411 */
  readonly url: string;
  close(): Promise<void>;
}

/** Listens on host:port (0 = a free port) and answers every request with `handle`. */
export async function listen(
  handle: (req: IncomingMessage, res: ServerResponse) => Promise<void>,
  port: number,
  host = "127.0.0.1",
): Promise<RunningServer> {
  const server = createServer((req, res) => {
    handle(req, res).catch((err) => {
      console.error("[fake] unhandled error", err);
      if (!res.headersSent) res.writeHead(500, { "Content-Type": "application/json" });
      res.end(JSON.stringify({ error: { type: "api_error", message: "The fake failed unexpectedly." } }));
    });
  });
  server.keepAliveTimeout = 5_000;
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const actual = (server.address() as AddressInfo).port;
  return {
    server,
    port: actual,
    url: `http://${host}:${actual}`,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
        if (!server.listening) resolve();
      }),
  };
}

/**
 * A planned outage: "unavailable" answers 503 to the service's API (health and admin stay up so a
 * test can end it); "refuse" closes the listening socket so connections are refused, then listens
 * again after `seconds`.
 */
export class Outage {
  mode: OutageMode = "none";
  until: number | null = null;
  private timer: NodeJS.Timeout | null = null;

  constructor(private readonly running: () => RunningServer | null) {}

  start(mode: OutageMode, seconds: number | null): void {
    this.end();
    if (mode === "none") return;
    this.mode = mode;
    this.until = seconds ? Date.now() + seconds * 1000 : null;
    if (mode === "refuse") {
      const r = this.running();
      if (!r) return;
      const secs = Math.max(0.05, Math.min(seconds ?? 5, 600));
      this.until = Date.now() + secs * 1000;
      // Close after this response has gone out, so the admin call itself still gets its answer.
      setImmediate(() => {
        r.server.close();
        r.server.closeAllConnections();
      });
      this.timer = setTimeout(() => {
        r.server.listen(r.port, "127.0.0.1");
        this.mode = "none";
        this.until = null;
      }, secs * 1000);
    } else if (seconds) {
      this.timer = setTimeout(() => this.end(), seconds * 1000);
    }
  }

  /** Ends the outage; `relisten: false` when the server is being shut down anyway. */
  end(relisten = true): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    const r = this.running();
    if (relisten && this.mode === "refuse" && r && !r.server.listening) r.server.listen(r.port, "127.0.0.1");
    this.mode = "none";
    this.until = null;
  }

  get unavailable(): boolean {
    return this.mode === "unavailable";
  }

  describe(): { mode: OutageMode; until: string | null } {
    return { mode: this.mode, until: this.until ? new Date(this.until).toISOString() : null };
  }
}

/** For a fake's server.ts: stop on SIGTERM/SIGINT after `close` has saved its state. */
export function stopOnSignals(name: string, close: () => Promise<void>): void {
  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    close()
      .catch((err) => console.error(`[${name}] error while stopping`, err))
      .finally(() => process.exit(0));
  };
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}
