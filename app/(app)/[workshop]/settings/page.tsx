import type { Metadata } from "next";
import { Card, CardBody, CardHeader } from "@/components/ui/card";
import { requireWorkshopPage } from "@/lib/auth/pages";
import { getWorkshopSettings, toSettingsOut } from "@/lib/data/workshop-settings";
import { LogoForm } from "./lazy-logo-form";
import { SettingsForm } from "./settings-form";
import { StageTemplateForm } from "./stage-template-form";

export const metadata: Metadata = { title: "Settings" };

// The owner's settings for the whole workshop (403 for every other role), the logo among them (uploaded
// through the photo pipeline's `workshopLogo` route). Changes go to the audit log.
export default async function SettingsPage({ params }: { params: Promise<{ workshop: string }> }) {
  const { workshop: slug } = await params;
  const ctx = await requireWorkshopPage(slug, "settings.manage", `/${slug}/settings`);
  const settings = toSettingsOut(await getWorkshopSettings(ctx.scope));
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <Card className="min-w-0 self-start">
        <CardHeader title="Workshop" subtitle="Name, units, money and e-mail" />
        <CardBody className="space-y-6">
          <SettingsForm slug={slug} settings={settings} />
          <div className="space-y-3 border-t border-spruce-100 pt-4">
            <h3 className="text-sm font-semibold">Logo</h3>
            <LogoForm slug={slug} logoUrl={settings.logoUrl} />
          </div>
        </CardBody>
      </Card>
      <Card className="min-w-0 self-start">
        <CardHeader title="Build stages" subtitle="The workshop's own stages between the deposit and the final setup" />
        <CardBody>
          <StageTemplateForm slug={slug} stages={settings.buildStages} />
        </CardBody>
      </Card>
    </div>
  );
}
