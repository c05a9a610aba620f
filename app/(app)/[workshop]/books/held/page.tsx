import type { Metadata } from "next";
import Link from "next/link";
import { formatMinor, formatWhen } from "@/components/commissions/format";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { Table, TBody, Td, Th, THead } from "@/components/ui/table";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getHoldings } from "@/lib/data/ledger-holdings";
import type { AmountOut } from "@/lib/schemas/books";

export const metadata: Metadata = { title: "Held and earned" };

const list = (amounts: AmountOut[]) => (amounts.length ? amounts.map((a) => formatMinor(a.amountMinor, a.currency)).join(" · ") : "Nothing");

// Deposits held for commissions whose build has not started (a liability) against earned income.
export default async function HeldPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "ledger.read", `/${slug}/books/held`);
  const h = await getHoldings(ctx.scope);
  return (
    <div className="space-y-5">
      <div>
        <h2 className="text-xl font-semibold">Held and earned</h2>
        <p className="max-w-3xl text-sm text-graphite-600">
          Money received for a commission is <strong>held</strong> — the client&apos;s money, which the workshop may have to give back — until the
          commission&apos;s build starts (its first move into a build stage). From then on it is <strong>earned</strong>. Money received once the build has
          started is earned when it arrives; a refund reduces whichever it comes out of. A commission cancelled before its build keeps its deposit held until it
          is refunded. As of {formatWhen(h.asOf)}.
        </p>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <Card>
          <CardHeader title="Held (a liability)" subtitle="Deposits for builds not yet started" />
          <CardBody>
            <p className="font-mono text-2xl" data-testid="held-total">
              {list(h.held)}
            </p>
          </CardBody>
        </Card>
        <Card>
          <CardHeader title="Earned to date" subtitle="Money of commissions whose build has started, less refunds" />
          <CardBody>
            <p className="font-mono text-2xl" data-testid="earned-total">
              {list(h.earned)}
            </p>
          </CardBody>
        </Card>
      </div>
      <Table caption="Commissions holding money" aria-label="Commissions holding money">
        <THead>
          <tr>
            <Th>Commission</Th>
            <Th>Client</Th>
            <Th>Stage</Th>
            <Th>Held since</Th>
            <Th className="text-right">Held</Th>
          </tr>
        </THead>
        <TBody>
          {h.commissions.length === 0 ? (
            <tr>
              <Td colSpan={5}>No commission holds money now.</Td>
            </tr>
          ) : (
            h.commissions.map((c) => (
              <tr key={c.id}>
                <Td>
                  <Link href={`/${slug}/commissions/${c.id}/payments`} className="font-mono font-semibold text-rosewood-700 underline-offset-2 hover:underline">
                    {c.number}
                  </Link>{" "}
                  {c.title}
                </Td>
                <Td>{c.client}</Td>
                <Td>{c.stageLabel}</Td>
                <Td>{formatWhen(c.since)}</Td>
                <Td numeric>{formatMinor(c.heldMinor, c.currency)}</Td>
              </tr>
            ))
          )}
        </TBody>
      </Table>
    </div>
  );
}
