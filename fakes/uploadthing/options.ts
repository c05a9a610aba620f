// Settings of the UploadThing fake, from the environment (server.ts) or given directly (tests).
import { join } from "node:path";

export interface UploadthingFakeOptions {
  /** 0 = a free port (tests). */
  port: number;
  /** The secret the SDK signs with (the token's apiKey). */
  apiKey: string;
  appId: string;
  /** Folder for state.json and files/; null keeps everything in memory (tests). */
  dataDir: string | null;
  /** Browser origins allowed to HEAD/PUT uploads and fetch files (CORS). */
  allowedOrigins: string[];
  /** Base URL the fake gives out for its files and as the callback `origin`; defaults to the listen URL. */
  publicUrl: string | null;
  /** How long a PUT waits for the app's /callback-result before answering without server data. */
  callbackTimeoutMs: number;
  quiet: boolean;
}

/** The app's origin as both localhost and 127.0.0.1 (the browser may use either). */
export function originsFor(appUrl: string): string[] {
  const origin = new URL(appUrl).origin;
  return [...new Set([origin, origin.replace("//127.0.0.1", "//localhost"), origin.replace("//localhost", "//127.0.0.1")])];
}

export function optionsFromEnv(env: NodeJS.ProcessEnv = process.env): UploadthingFakeOptions {
  const fakesDir = env.FAKES_DATA_DIR ?? join(env.DATA_DIR ?? ".data", "fakes");
  const extra = (env.FAKE_UPLOADTHING_ALLOWED_ORIGINS ?? "").split(",").map((s) => s.trim()).filter(Boolean);
  return {
    port: Number(env.FAKE_UPLOADTHING_PORT ?? 3412),
    apiKey: env.UPLOADTHING_API_KEY ?? "sk_fake_local_uploadthing",
    appId: env.UPLOADTHING_APP_ID ?? "scalewright-local",
    dataDir: join(fakesDir, "uploadthing"),
    allowedOrigins: [...originsFor(env.APP_URL ?? "http://localhost:3000"), ...extra],
    publicUrl: env.FAKE_UPLOADTHING_PUBLIC_URL || null,
    callbackTimeoutMs: Number(env.FAKE_UPLOADTHING_CALLBACK_TIMEOUT_MS ?? 15_000),
    quiet: false,
  };
}

export function testOptions(overrides: Partial<UploadthingFakeOptions> = {}): UploadthingFakeOptions {
  return {
    port: 0,
    apiKey: "sk_fake_in_process_uploadthing",
    appId: "scalewright-test-app",
    dataDir: null,
    allowedOrigins: [],
    publicUrl: null,
    callbackTimeoutMs: 5000,
    quiet: true,
    ...overrides,
  };
}
