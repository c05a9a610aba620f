import type { Metadata } from "next";
import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireUserPage } from "@/lib/auth/pages";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { listMembershipsForUser } from "@/lib/data/memberships";
import { NameForm, PasswordForm } from "./account-forms";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const user = await requireUserPage("/account");
  const memberships = await listMembershipsForUser(user.id);
  return (
    <div className="mx-auto grid max-w-4xl gap-6 px-4 py-10 sm:px-6 md:grid-cols-2">
      <h1 className="text-3xl font-semibold md:col-span-2">Your account</h1>
      <Card>
        <CardHeader title="Name and address" subtitle={`You sign in as ${user.email}.`} />
        <CardBody>
          <NameForm name={user.name} />
        </CardBody>
      </Card>
      <Card>
        <CardHeader
          title={user.hasPassword ? "Change your password" : "Set a password"}
          subtitle={user.hasPassword ? "Changing it signs you out on every other device." : "You sign in by e-mailed links; a password is optional."}
        />
        <CardBody>
          <PasswordForm hasPassword={user.hasPassword} />
        </CardBody>
      </Card>
      <Card className="md:col-span-2">
        <CardHeader title="Your workshops" />
        <CardBody>
          {memberships.length === 0 ? (
            <p className="text-sm text-graphite-600">None yet.</p>
          ) : (
            <ul className="divide-y divide-spruce-100">
              {memberships.map((m) => (
                <li key={m.workshop.slug} className="flex items-center justify-between py-2">
                  <Link href={`/${m.workshop.slug}`} className="font-semibold text-rosewood-700 hover:underline">
                    {m.workshop.name}
                  </Link>
                  <Badge>{ROLE_LABELS[m.role]}</Badge>
                </li>
              ))}
            </ul>
          )}
        </CardBody>
      </Card>
    </div>
  );
}
