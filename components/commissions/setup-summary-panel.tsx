// The overview's summary of the signed final setup sheet (the lines the delivery e-mail carries),
// for everyone who may see the commission; the full readout is on the setup tab.
import Link from "next/link";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { formatDay } from "./format";

export interface SignedSetupSummary {
  revision: number;
  signedAt: string | null;
  lines: string[];
}

export function SetupSummaryPanel({ setup, setupHref }: { setup: SignedSetupSummary; setupHref: string | null }) {
  return (
    <Card aria-label="Final setup">
      <CardHeader title="Final setup" subtitle={`Revision ${setup.revision}, signed ${formatDay(setup.signedAt)}`} />
      <CardBody className="space-y-3 text-sm">
        <ul className="list-disc space-y-1 pl-5" aria-label="Setup summary">
          {setup.lines.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
        {setupHref ? (
          <Link href={setupHref} className="inline-block font-semibold text-rosewood-700 underline">
            Open the setup sheet
          </Link>
        ) : null}
      </CardBody>
    </Card>
  );
}
