import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { Badge } from "@/components/ui/badge";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";
import { requireUserPage } from "@/lib/auth/pages";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { listMembershipsForUser } from "@/lib/data/memberships";

export const metadata: Metadata = { title: "Your workshops" };

// Where sign-in lands: straight into the workshop for people in one, a choice for the others.
export default async function WorkshopsPage({ searchParams }: { searchParams: Promise<{ all?: string }> }) {
  const user = await requireUserPage("/workshops");
  const memberships = await listMembershipsForUser(user.id);
  const { all } = await searchParams;
  if (memberships.length === 1 && !all) redirect(`/${memberships[0]!.workshop.slug}`);

  return (
    <div className="mx-auto max-w-3xl px-4 py-10 sm:px-6">
      <h1 className="text-3xl font-semibold">Your workshops</h1>
      {memberships.length === 0 ? (
        <Card className="mt-6">
          <CardBody className="space-y-3">
            <p>You do not belong to a workshop yet. Ask a workshop&apos;s owner to invite you, or create your own.</p>
            <Link href="/workshops/new" className={buttonClasses("primary")}>
              Create a workshop
            </Link>
          </CardBody>
        </Card>
      ) : (
        <>
          <ul className="mt-6 grid gap-3 sm:grid-cols-2">
            {memberships.map((m) => (
              <li key={m.workshop.slug}>
                <Link href={`/${m.workshop.slug}`} className="block rounded-panel border border-spruce-200 bg-white p-4 shadow-panel hover:border-brass-500">
                  <span className="block font-display text-lg font-semibold">{m.workshop.name}</span>
                  <Badge tone={m.role === "owner" ? "primary" : "neutral"} className="mt-2">
                    {ROLE_LABELS[m.role]}
                  </Badge>
                </Link>
              </li>
            ))}
          </ul>
          <Link href="/workshops/new" className={buttonClasses("secondary", "md", "mt-6")}>
            Create a workshop
          </Link>
        </>
      )}
    </div>
  );
}
