"use client";

import { useState, useTransition } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { invitationSignUpSchema } from "@/lib/schemas/member";
import { acceptInvitationAction, acceptWithNewAccountAction } from "./actions";

const invitationSignUpResolver = lazyZodResolver(() => import("@/lib/schemas/member").then((m) => m.invitationSignUpSchema));

export function AcceptButton({ token, workshopName }: { token: string; workshopName: string }) {
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<string | null>(null);
  const accept = () =>
    startTransition(async () => {
      const r = await acceptInvitationAction({ token });
      if (r.ok) window.location.assign(r.data.redirectTo);
      else setMessage(r.message);
    });
  return (
    <div className="space-y-3">
      {message ? <Alert tone="error">{message}</Alert> : null}
      <Button onClick={accept} busy={pending}>
        Join {workshopName}
      </Button>
    </div>
  );
}

export function NewAccountForm({ token, email }: { token: string; email: string }) {
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof invitationSignUpSchema>>({
    resolver: invitationSignUpResolver,
    defaultValues: { token, name: "", password: "" },
  });
  const { errors, isSubmitting } = formState;
  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const r = await acceptWithNewAccountAction(values);
    if (r.ok) window.location.assign(r.data.redirectTo);
    else setMessage(applyActionErrors(r, setError, ["name", "password"]));
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {message ? <Alert tone="error">{message}</Alert> : null}
      <p className="text-sm text-graphite-700">
        Your account will be <strong>{email}</strong>.
      </p>
      <input type="hidden" {...register("token")} />
      <TextField id="name" label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <TextField
        id="password"
        label="Password (optional)"
        type="password"
        autoComplete="new-password"
        hint="Leave it empty to sign in with e-mailed links only; you can set one later."
        error={errors.password?.message}
        {...register("password")}
      />
      <Button type="submit" className="w-full" busy={isSubmitting}>
        Accept and join
      </Button>
    </form>
  );
}
