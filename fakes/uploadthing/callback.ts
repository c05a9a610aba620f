// Telling the app a file is in, as the hosted service does: POST {callbackUrl}?slug=S with
// `uploadthing-hook: callback` and the body signed with the API key — or, in dev mode, one signed
// JSON line on the open /route-metadata answer, which the SDK forwards itself.
import type { UtContext } from "./context";
import { sign } from "./signing";
import type { FileRecord, Registration } from "./state";

export function callbackBody(ctx: UtContext, reg: Registration, file: FileRecord): string {
  const url = ctx.fileUrl(file);
  return JSON.stringify({
    status: "uploaded",
    metadata: reg.metadata ?? {},
    file: {
      name: file.name,
      size: file.size,
      type: file.type,
      lastModified: file.lastModified,
      customId: file.customId,
      key: file.key,
      url,
      appUrl: url,
      ufsUrl: url,
      fileHash: file.fileHash,
    },
    origin: ctx.publicUrl(),
  });
}

/** Non-dev: POST the callback, three tries. True when the app answered 2xx. */
export async function postCallback(ctx: UtContext, reg: Registration, file: FileRecord): Promise<boolean> {
  const body = callbackBody(ctx, reg, file);
  const target = new URL(reg.callbackUrl);
  target.searchParams.set("slug", reg.callbackSlug);
  for (let attempt = 1; attempt <= 3; attempt++) {
    let status: number | null = null;
    let error: string | null = null;
    try {
      const res = await fetch(target, {
        method: "POST",
        headers: {
          "Content-Type": "application/json",
          "uploadthing-hook": "callback",
          "x-uploadthing-signature": sign(body, ctx.opts.apiKey),
        },
        body,
        signal: AbortSignal.timeout(ctx.opts.callbackTimeoutMs),
      });
      status = res.status;
      await res.arrayBuffer().catch(() => undefined);
      if (!res.ok) error = `HTTP ${res.status}`;
    } catch (err) {
      error = (err as { cause?: { code?: string } }).cause?.code ?? String(err);
    }
    ctx.state.callbacks.push({ at: new Date().toISOString(), key: file.key, url: target.href, status, error });
    ctx.state.callbacks.splice(0, Math.max(0, ctx.state.callbacks.length - 200));
    ctx.store.changed();
    if (!error) return true;
    await new Promise((r) => setTimeout(r, 200 * attempt));
  }
  return false;
}

/** Dev: write the signed callback on the registration's open stream; end it after the last file. */
export function pushDevCallback(ctx: UtContext, reg: Registration, file: FileRecord): boolean {
  const stream = ctx.devStreams.get(reg.id);
  if (!stream) return false;
  const payload = callbackBody(ctx, reg, file);
  stream.res.write(`${JSON.stringify({ payload, signature: sign(payload, ctx.opts.apiKey), hook: "callback" })}\n`);
  stream.pending.delete(file.key);
  if (stream.pending.size === 0) {
    stream.res.end();
    ctx.devStreams.delete(reg.id);
  }
  return true;
}
