"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { ROLE_LABELS, ROLES } from "@/lib/auth/permissions";
import type { InvitationCreateInput } from "@/lib/schemas/member";
import { inviteMemberAction } from "./actions";

const invitationCreateResolver = lazyZodResolver(() => import("@/lib/schemas/member").then((m) => m.invitationCreateSchema));

export function InviteForm({ slug }: { slug: string }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<InvitationCreateInput>({
    resolver: invitationCreateResolver,
    defaultValues: { email: "", role: "client" },
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const r = await inviteMemberAction(slug, values);
    if (r.ok) {
      setNotice({ tone: "success", text: `Invitation sent to ${r.data.email}.` });
      reset({ email: "", role: values.role });
      router.refresh();
    } else {
      const message = applyActionErrors(r, setError, ["email", "role"]);
      if (message) setNotice({ tone: "error", text: message });
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <TextField id="invite-email" label="E-mail address" type="email" autoComplete="off" error={errors.email?.message} {...register("email")} />
      <Field id="invite-role" label="Role" error={errors.role?.message}>
        <Select id="invite-role" {...describedBy("invite-role", errors.role?.message)} options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))} {...register("role")} />
      </Field>
      <Button type="submit" busy={isSubmitting}>
        Send invitation
      </Button>
    </form>
  );
}
