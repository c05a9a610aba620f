// POST /api/compute from tests, each caller on its own made-up client address (TEST-NET-3,
// RFC 5737) so the per-IP limit of one test never throttles another.
import { appUrl } from "./app-url";

export function testIp(): string {
  const octet = () => 1 + Math.floor(Math.random() * 254);
  return Math.random() < 0.5 ? `203.0.113.${octet()}` : `198.51.100.${octet()}`;
}

export async function postCompute(body: unknown, ip = testIp(), raw = false): Promise<Response> {
  return fetch(appUrl("/api/compute"), {
    method: "POST",
    headers: { "content-type": "application/json", "x-forwarded-for": ip },
    body: raw ? (body as string) : JSON.stringify(body),
  });
}
