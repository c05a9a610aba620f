// An in-process uploads fake for one test file, which the test can break on purpose (its byte
// store and state are reachable), with the app's shared UTApi pointed at it.
import { afterAll, beforeAll } from "vitest";
import { startUploadthingFake, type UploadthingFake } from "@/fakes/uploadthing/app";
import { testOptions } from "@/fakes/uploadthing/options";
import { createUtApi, uploadthingSettings } from "@/lib/services/uploadthing";

export interface BreakableUploadsFake {
  readonly fake: UploadthingFake;
  /** A UTApi of our own on the fake (to store originals as a browser would, or to delete). */
  utapi(): ReturnType<typeof createUtApi>;
  /** The keys of every file the fake holds now. */
  storedKeys(): string[];
}

/** Starts the fake before the file's tests and closes it after them. */
export function useBreakableUploadsFake(): BreakableUploadsFake {
  let fake: UploadthingFake | undefined;
  beforeAll(async () => {
    const env = uploadthingSettings();
    fake = await startUploadthingFake(testOptions({ apiKey: env.apiKey, appId: env.appId }));
    // The app's shared UTApi reads these on first use: point it at this file's fake.
    process.env.UPLOADTHING_INGEST_URL = fake.url;
    process.env.UPLOADTHING_API_URL = fake.url;
    process.env.UPLOADTHING_UFS_HOST = `localhost:${fake.port}`;
  });
  afterAll(async () => {
    await fake?.close();
  });
  const started = () => {
    if (!fake) throw new Error("the uploads fake is not started yet");
    return fake;
  };
  return {
    get fake() {
      return started();
    },
    utapi: () => createUtApi(uploadthingSettings({ ...process.env, UPLOADTHING_INGEST_URL: started().url, UPLOADTHING_API_URL: started().url, UPLOADTHING_UFS_HOST: `localhost:${started().port}` })),
    storedKeys: () => Object.keys(started().ctx.state.files),
  };
}
