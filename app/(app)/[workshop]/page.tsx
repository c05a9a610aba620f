import type { Metadata } from "next";
import Link from "next/link";
import { RecentCommissions } from "@/components/commissions/recent-commissions";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { ROLE_LABELS, ROLES } from "@/lib/auth/permissions";
import { countMembersByRole } from "@/lib/data/memberships";

export async function generateMetadata({ params }: { params: Promise<{ workshop: string }> }): Promise<Metadata> {
  const { workshop } = await requireWorkshopPage((await params).workshop, "workshop.read");
  return { title: workshop.name };
}

// The workshop's home. Later features (commissions, payments, the build calculator) add their
// panels here; for now it shows the workshop's settings and who is in it.
export default async function WorkshopHome({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const { workshop, scope, can, user, membership } = await requireWorkshopPage(slug, "workshop.read");
  const counts = can("member.names") ? await countMembersByRole(scope) : null;
  return (
    <div className="grid gap-4 md:grid-cols-2">
      {can("commission.read") ? (
        <RecentCommissions slug={workshop.slug} title={membership.role === "client" ? "Your commissions" : "Recent commissions"} canCreate={can("commission.create")} />
      ) : null}
      <Card>
        <CardHeader title={`Welcome, ${user.name}`} subtitle="What this workshop works in" />
        <CardBody>
          <dl className="grid grid-cols-2 gap-3 text-sm">
            <dt className="text-graphite-500">Lengths</dt>
            <dd className="font-semibold">{workshop.unitPreference === "mm" ? "Millimetres" : "Inches"}</dd>
            <dt className="text-graphite-500">Currency</dt>
            <dd className="font-mono font-semibold">{workshop.currency}</dd>
            <dt className="text-graphite-500">Address</dt>
            <dd className="font-mono">/{workshop.slug}</dd>
          </dl>
        </CardBody>
      </Card>
      {counts ? (
        <Card>
          <CardHeader
            title="People"
            action={
              <Link href={`/${workshop.slug}/members`} className="text-sm font-semibold text-rosewood-700 underline-offset-2 hover:underline">
                {can("member.manage") ? "Manage members" : "See members"}
              </Link>
            }
          />
          <CardBody>
            <ul className="grid grid-cols-2 gap-2 text-sm">
              {ROLES.map((r) => (
                <li key={r} className="flex justify-between rounded-chip bg-spruce-50 px-3 py-2">
                  <span>{ROLE_LABELS[r]}s</span>
                  <span className="font-mono font-semibold tabular">{counts[r]}</span>
                </li>
              ))}
            </ul>
          </CardBody>
        </Card>
      ) : null}
    </div>
  );
}
