// A small HTTP listener standing in for the app's webhook route: it keeps each raw body and its
// Stripe-Signature header, can answer 500 for a while, or stop listening and come back on its port.
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";

export interface Received {
  raw: string;
  signature: string;
  at: number;
}

export interface WebhookListener {
  url: string;
  received: Received[];
  /** Answer 500 to every delivery while true. */
  failing: boolean;
  stop(): Promise<void>;
  restart(): Promise<void>;
  close(): Promise<void>;
  /** Waits until `count` deliveries have arrived (or throws after `ms`). */
  waitFor(count: number, ms?: number): Promise<Received[]>;
}

export async function startWebhookListener(): Promise<WebhookListener> {
  let port = 0;
  const received: Received[] = [];
  const state = { failing: false };
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      if (state.failing) {
        res.writeHead(500).end("down for the test");
        return;
      }
      received.push({ raw: Buffer.concat(chunks).toString("utf8"), signature: String(req.headers["stripe-signature"] ?? ""), at: Date.now() });
      res.writeHead(200, { "Content-Type": "application/json" }).end('{"received":true}');
    });
  });
  const up = () => new Promise<void>((r) => server.listen(port, "127.0.0.1", () => r()));
  const down = () =>
    new Promise<void>((r) => {
      server.closeAllConnections();
      server.close(() => r());
    });
  await up();
  port = (server.address() as AddressInfo).port;
  return {
    url: `http://127.0.0.1:${port}/api/webhooks/stripe`,
    received,
    get failing() {
      return state.failing;
    },
    set failing(v: boolean) {
      state.failing = v;
    },
    stop: down,
    restart: up,
    close: down,
    async waitFor(count, ms = 5000) {
      const deadline = Date.now() + ms;
      while (received.length < count) {
        if (Date.now() > deadline) throw new Error(`expected ${count} webhook deliveries, got ${received.length}`);
        await new Promise((r) => setTimeout(r, 20));
      }
      return received.slice(0, count);
    },
  };
}

/** Waits a fixed time (to show that something did NOT arrive). */
export const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));
