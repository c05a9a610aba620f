// Fuzzing every query string, and the bodies of the routes outside a workshop (sign-in, account,
// compute, invitations, the processor's webhook, uploads): the other half of the targets of
// tests/security/fuzz-harness.ts (fuzz-workshop-bodies.test.ts has the workshop routes' bodies),
// about 800 cases shared by the targets.
// Routes made by a library (Auth.js, UploadThing) are fuzzed for crashes, leaks and stored changes;
// their refusals are the library's own, not our error body.
import { describeFuzz, fuzzTargets } from "./fuzz-harness";

const reads = (t: ReturnType<typeof fuzzTargets>[number]) =>
  t.schemaRef?.name ?? (t.route.library ? "made by a library" : t.route.readsRaw ? "reads the raw request" : "schema defined in the route file");

describeFuzz(
  "fuzzing every query string and the bodies of the routes outside a workshop",
  fuzzTargets().filter((t) => !(t.part === "body" && t.route.pattern.startsWith("/api/workshops/[workshop]/"))),
  { budget: 800, minTargets: 10, label: (t) => `${t.part} of ${t.route.id} (${reads(t)})` },
);
