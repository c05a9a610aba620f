"use client";

import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { SignUpInput } from "@/lib/schemas/auth";
import { PASSWORD_MIN } from "@/lib/schemas/auth-values";
import { signUpAction } from "./actions";

const signUpResolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.signUpSchema));

export function SignUpForm({ callbackUrl }: { callbackUrl: string }) {
  const [message, setMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<SignUpInput>({
    resolver: signUpResolver,
    defaultValues: { name: "", email: "", password: "" },
  });
  const { errors, isSubmitting } = formState;
  const onSubmit = handleSubmit(async (values) => {
    setMessage(null);
    const r = await signUpAction({ ...values, callbackUrl });
    if (r.ok) window.location.assign(r.data.redirectTo);
    else setMessage(applyActionErrors(r, setError, ["name", "email", "password"]));
  });
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {message ? <Alert tone="error">{message}</Alert> : null}
      <TextField id="name" label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <TextField id="email" label="E-mail" type="email" autoComplete="email" error={errors.email?.message} {...register("email")} />
      <TextField id="password" label="Password" type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN} characters.`} error={errors.password?.message} {...register("password")} />
      <Button type="submit" className="w-full" busy={isSubmitting}>
        Create the account
      </Button>
      <p className="text-center text-sm text-graphite-600">
        Have an account?{" "}
        <Link href={`/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`} className="font-semibold text-rosewood-700 hover:underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
