// Entry point the launcher starts: the Stripe fake on FAKE_STRIPE_PORT, state in FAKES_DATA_DIR/stripe.
import { stopOnSignals } from "../kit/serve";
import { startStripeFake } from "./app";
import { optionsFromEnv } from "./options";

const opts = optionsFromEnv();
const fake = await startStripeFake(opts);
console.log(`[stripe fake] API and hosted checkout on ${fake.url}; webhooks to ${fake.webhooks.targetUrl()}; admin: ${fake.url}/admin`);
stopOnSignals("stripe fake", () => fake.close());
