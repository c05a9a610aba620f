"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { accountNameSchema, changePasswordSchema } from "@/lib/schemas/auth";
import { changePasswordAction, renameAction } from "./actions";

const accountNameResolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.accountNameSchema));
const changePasswordResolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.changePasswordSchema));

type Notice = { tone: "success" | "error"; text: string } | null;

export function NameForm({ name }: { name: string }) {
  const router = useRouter();
  const [notice, setNotice] = useState<Notice>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof accountNameSchema>>({
    resolver: accountNameResolver,
    defaultValues: { name },
  });
  const onSubmit = handleSubmit(async (values) => {
    const r = await renameAction(values);
    if (r.ok) {
      setNotice({ tone: "success", text: "Saved." });
      router.refresh();
    } else {
      const m = applyActionErrors(r, setError, ["name"]);
      setNotice(m ? { tone: "error", text: m } : null);
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      <TextField id="account-name" label="Your name" autoComplete="name" error={formState.errors.name?.message} {...register("name")} />
      <Button type="submit" busy={formState.isSubmitting}>
        Save
      </Button>
    </form>
  );
}

export function PasswordForm({ hasPassword }: { hasPassword: boolean }) {
  const router = useRouter();
  const [notice, setNotice] = useState<Notice>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<z.input<typeof changePasswordSchema>>({
    resolver: changePasswordResolver,
    defaultValues: { current: "", password: "", confirm: "" },
  });
  const { errors, isSubmitting } = formState;
  const onSubmit = handleSubmit(async (values) => {
    const r = await changePasswordAction(values);
    if (r.ok) {
      setNotice({ tone: "success", text: hasPassword ? "Password changed. Other devices are signed out." : "Password set." });
      reset();
      router.refresh();
    } else {
      const m = applyActionErrors(r, setError, ["current", "password", "confirm"]);
      setNotice(m ? { tone: "error", text: m } : null);
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {notice ? <Alert tone={notice.tone}>{notice.text}</Alert> : null}
      {hasPassword ? (
        <TextField id="current-password" label="Current password" type="password" autoComplete="current-password" error={errors.current?.message} {...register("current")} />
      ) : null}
      <TextField id="new-password" label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." error={errors.password?.message} {...register("password")} />
      <TextField id="confirm-password" label="New password again" type="password" autoComplete="new-password" error={errors.confirm?.message} {...register("confirm")} />
      <Button type="submit" busy={isSubmitting}>
        {hasPassword ? "Change password" : "Set password"}
      </Button>
    </form>
  );
}
