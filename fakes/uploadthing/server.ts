// Entry point the launcher starts: the UploadThing fake on FAKE_UPLOADTHING_PORT, files and state
// in FAKES_DATA_DIR/uploadthing.
import { stopOnSignals } from "../kit/serve";
import { startUploadthingFake } from "./app";
import { optionsFromEnv } from "./options";

const opts = optionsFromEnv();
const fake = await startUploadthingFake(opts);
console.log(`[uploadthing fake] ingest, API and files on ${fake.url}; callbacks to the app; CORS for ${opts.allowedOrigins.join(", ")}`);
stopOnSignals("uploadthing fake", () => fake.close());
