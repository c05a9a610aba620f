// The app's UploadThing settings and server client, from the environment. Locally (and in tests)
// every URL points at fakes/uploadthing; the SDK is configured only through its own options.
import { UTApi } from "uploadthing/server";
import type { RouteHandlerConfig } from "uploadthing/types";
import { z } from "zod";

const UploadthingEnv = z.object({
  UPLOADTHING_API_KEY: z.string().startsWith("sk_", "must be a secret key (sk_…)"),
  UPLOADTHING_APP_ID: z.string().min(1),
  FAKE_UPLOADTHING_PORT: z.coerce.number().int().min(1).max(65535).default(3412),
  APP_URL: z.url().default("http://localhost:3000"),
  UPLOADTHING_INGEST_URL: z.url().optional(),
  UPLOADTHING_API_URL: z.url().optional(),
  UPLOADTHING_UFS_HOST: z.string().min(1).optional(),
  UPLOADTHING_CALLBACK_URL: z.url().optional(),
  UPLOADTHING_IS_DEV: z.enum(["true", "false"]).default("false"),
  UPLOADTHING_LOG_LEVEL: z.enum(["All", "Fatal", "Error", "Warning", "Info", "Debug", "Trace", "None"]).default("Warning"),
});

export interface UploadthingSettings {
  token: string;
  apiKey: string;
  appId: string;
  ingestUrl: string;
  apiUrl: string;
  /** Host of file URLs. The SDK uses http only when this contains "local", hence localhost. */
  ufsHost: string;
  ufsAppIdLocation: "path";
  callbackUrl: string;
  isDev: boolean;
  logLevel: NonNullable<RouteHandlerConfig["logLevel"]>;
}

/** The SDK's token: base64 of `{apiKey, appId, regions}`. */
export function uploadthingToken(apiKey: string, appId: string): string {
  return Buffer.from(JSON.stringify({ apiKey, appId, regions: ["local"] })).toString("base64");
}

export function uploadthingSettings(env: Record<string, string | undefined> = process.env): UploadthingSettings {
  const parsed = UploadthingEnv.safeParse(env);
  if (!parsed.success) {
    const what = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
    throw new Error(`UploadThing settings are not valid (${what}). See .env.example.`);
  }
  const e = parsed.data;
  const fake = `http://127.0.0.1:${e.FAKE_UPLOADTHING_PORT}`;
  return {
    token: uploadthingToken(e.UPLOADTHING_API_KEY, e.UPLOADTHING_APP_ID),
    apiKey: e.UPLOADTHING_API_KEY,
    appId: e.UPLOADTHING_APP_ID,
    ingestUrl: e.UPLOADTHING_INGEST_URL ?? fake,
    apiUrl: e.UPLOADTHING_API_URL ?? fake,
    ufsHost: e.UPLOADTHING_UFS_HOST ?? `localhost:${e.FAKE_UPLOADTHING_PORT}`,
    ufsAppIdLocation: "path",
    // Set explicitly: the SDK's guess comes from the request URL, where Next turns 127.0.0.1 into localhost.
    callbackUrl: e.UPLOADTHING_CALLBACK_URL ?? `${e.APP_URL.replace(/\/$/, "")}/api/uploadthing`,
    isDev: e.UPLOADTHING_IS_DEV === "true",
    logLevel: e.UPLOADTHING_LOG_LEVEL,
  };
}

/** The `config` for `createRouteHandler({ router, config })`. */
export function uploadthingRouteConfig(settings: UploadthingSettings = uploadthingSettings()): RouteHandlerConfig {
  return {
    token: settings.token,
    ingestUrl: settings.ingestUrl,
    callbackUrl: settings.callbackUrl,
    isDev: settings.isDev,
    logLevel: settings.logLevel,
    logFormat: "logFmt",
  };
}

/** A server-side client for file operations (delete, signed URLs, listing). */
export function createUtApi(settings: UploadthingSettings = uploadthingSettings()): UTApi {
  return new UTApi({
    token: settings.token,
    apiUrl: settings.apiUrl,
    ingestUrl: settings.ingestUrl,
    ufsHost: settings.ufsHost,
    ufsAppIdLocation: settings.ufsAppIdLocation,
    logLevel: settings.logLevel,
    logFormat: "logFmt",
  });
}

let shared: UTApi | null = null;

/** The app's shared UTApi. */
export function utapi(): UTApi {
  shared ??= createUtApi();
  return shared;
}
