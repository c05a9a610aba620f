import type { Metadata } from "next";
import { ModelNotes } from "@/components/build-math/model-notes";
import { SafetyCaution } from "@/components/build-math/safety-caution";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { DEFAULT_PRESET_ID, presetById } from "@/lib/lutherie/presets";
import { SPEC_QUERY_PARAM } from "@/lib/lutherie/spec-url";
import { decodeSpec } from "@/lib/lutherie/spec-url-decode";
import { CalculatorClient } from "./calculator-client";

export const metadata: Metadata = {
  title: "Build calculator",
  description: "Fret positions for single and fanned necks, string tension and stress, pickup harmonics and setup helpers.",
};

// The public build calculator. A shared link carries the spec in ?spec=; anything unreadable falls
// back to the default preset with a notice.
export default async function CalculatorPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const raw = params[SPEC_QUERY_PARAM];
  const token = typeof raw === "string" ? raw : undefined;
  const fromLink = decodeSpec(token);
  const initialSpec = fromLink ?? presetById(DEFAULT_PRESET_ID).spec;

  return (
    <div className="mx-auto max-w-[96rem] space-y-6 px-4 py-10 sm:px-6">
      <header className="space-y-2">
        <p className="text-xs font-semibold uppercase tracking-[0.2em] text-rosewood-700">Build math, no sign-in</p>
        <h1 className="text-3xl font-semibold sm:text-4xl">Build calculator</h1>
        <p className="max-w-3xl text-graphite-700">
          Fret slots for single and fanned necks, tension and core stress per string, the harmonics each pickup position favours or cancels,
          and setup helpers. Results update as you type; the link in the address bar carries the whole spec.
        </p>
      </header>
      <SafetyCaution />
      <CalculatorClient initialSpec={initialSpec} linkProblem={token !== undefined && fromLink === null} />
      <Card>
        <CardHeader title="How these figures are worked out" subtitle="The models and their assumptions" />
        <CardBody>
          <ModelNotes />
        </CardBody>
      </Card>
    </div>
  );
}
