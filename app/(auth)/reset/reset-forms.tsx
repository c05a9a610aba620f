"use client";

import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { resetPasswordSchema, resetRequestSchema } from "@/lib/schemas/auth";
import { requestResetAction, resetPasswordAction } from "./actions";

const resetRequestResolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.resetRequestSchema));
const resetPasswordResolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.resetPasswordSchema));

export function ResetRequestForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof resetRequestSchema>>({
    resolver: resetRequestResolver,
    defaultValues: { email: "" },
  });
  const onSubmit = handleSubmit(async (values) => {
    const r = await requestResetAction(values);
    if (r.ok) setSentTo(r.data.email);
    else setMessage(applyActionErrors(r, setError, ["email"]));
  });
  if (sentTo) {
    return (
      <Alert tone="success">
        If an account exists for <strong>{sentTo}</strong>, a reset link is on its way. It works once, for one hour.
      </Alert>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {message ? <Alert tone="error">{message}</Alert> : null}
      <TextField id="email" label="E-mail" type="email" autoComplete="email" error={formState.errors.email?.message} {...register("email")} />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        E-mail me a reset link
      </Button>
    </form>
  );
}

export function ResetPasswordForm({ token }: { token: string }) {
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof resetPasswordSchema>>({
    resolver: resetPasswordResolver,
    defaultValues: { token, password: "", confirm: "" },
  });
  const { errors, isSubmitting } = formState;
  const onSubmit = handleSubmit(async (values) => {
    const r = await resetPasswordAction(values);
    if (r.ok) window.location.assign(r.data.redirectTo);
    else setMessage(applyActionErrors(r, setError, ["password", "confirm"]));
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {message ? <Alert tone="error">{message}</Alert> : null}
      <input type="hidden" {...register("token")} />
      <TextField id="password" label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." error={errors.password?.message} {...register("password")} />
      <TextField id="confirm" label="New password again" type="password" autoComplete="new-password" error={errors.confirm?.message} {...register("confirm")} />
      <Button type="submit" className="w-full" busy={isSubmitting}>
        Save the new password
      </Button>
    </form>
  );
}
