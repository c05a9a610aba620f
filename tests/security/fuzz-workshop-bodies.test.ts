// Fuzzing the JSON bodies of every workshop route (the targets of tests/security/fuzz-harness.ts
// under /api/workshops/[workshop]/…; fuzz-other-inputs.test.ts has the rest). Each target is sent
// inputs derived from its zod schema and from its access-table row's valid request broken in one
// place, by a member whose role the table lets through: about 1,700 cases shared by the targets.
import { describeFuzz, fuzzTargets } from "./fuzz-harness";

describeFuzz(
  "fuzzing the JSON body of every workshop route",
  fuzzTargets().filter((t) => t.part === "body" && t.route.pattern.startsWith("/api/workshops/[workshop]/")),
  { budget: 1_700, minTargets: 15, label: (t) => `${t.route.id} (${t.schemaRef?.name ?? "no schema found"})` },
);
