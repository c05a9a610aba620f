"use client";

import Link from "next/link";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyActionErrors } from "@/components/forms/action-errors";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { TextField } from "@/components/forms/text-field";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import type { PasswordSignInInput } from "@/lib/schemas/auth";
import { cx } from "@/lib/ui/cx";
import { sendSignInLinkAction, signInWithPasswordAction } from "./actions";

const passwordSignInResolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.passwordSignInSchema));
const magicLinkResolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.magicLinkSchema));

type Mode = "password" | "link";

export function SignInForm({ callbackUrl, initialEmail, initialMessage, notice }: { callbackUrl: string; initialEmail: string; initialMessage: string | null; notice: string | null }) {
  const [mode, setMode] = useState<Mode>("password");
  const [message, setMessage] = useState<string | null>(initialMessage);
  const [sentTo, setSentTo] = useState<string | null>(null);

  const password = useForm<PasswordSignInInput>({ resolver: passwordSignInResolver, defaultValues: { email: initialEmail, password: "" } });
  const link = useForm<{ email: string }>({ resolver: magicLinkResolver, defaultValues: { email: initialEmail } });

  const onPassword = password.handleSubmit(async (values) => {
    setMessage(null);
    const r = await signInWithPasswordAction({ ...values, callbackUrl });
    if (r.ok) window.location.assign(r.data.redirectTo);
    else setMessage(applyActionErrors(r, password.setError, ["email"]) ?? r.message);
  });

  const onLink = link.handleSubmit(async (values) => {
    setMessage(null);
    const r = await sendSignInLinkAction({ ...values, callbackUrl });
    if (r.ok) setSentTo(r.data.email);
    else setMessage(applyActionErrors(r, link.setError, ["email"]));
  });

  const tab = (m: Mode, label: string) => (
    <button
      type="button"
      role="tab"
      aria-selected={mode === m}
      onClick={() => {
        setMode(m);
        setMessage(null);
      }}
      className={cx("flex-1 rounded-chip px-3 py-2 text-sm font-semibold", mode === m ? "bg-white shadow-panel" : "text-graphite-600 hover:text-graphite-900")}
    >
      {label}
    </button>
  );

  return (
    <div className="space-y-5">
      {notice ? <Alert tone="success">{notice}</Alert> : null}
      <div role="tablist" aria-label="How to sign in" className="flex gap-1 rounded-panel bg-spruce-100 p-1">
        {tab("password", "Password")}
        {tab("link", "E-mail me a link")}
      </div>
      {message ? <Alert tone="error">{message}</Alert> : null}

      {mode === "password" ? (
        <form onSubmit={onPassword} noValidate className="space-y-4" aria-label="Sign in with a password">
          <TextField id="email" label="E-mail" type="email" autoComplete="email" error={password.formState.errors.email?.message} {...password.register("email")} />
          <TextField
            id="password"
            label="Password"
            type="password"
            autoComplete="current-password"
            error={password.formState.errors.password?.message}
            {...password.register("password")}
          />
          <Button type="submit" className="w-full" busy={password.formState.isSubmitting}>
            Sign in
          </Button>
          <p className="text-center text-sm">
            <Link href="/reset" className="text-rosewood-700 underline-offset-2 hover:underline">
              Forgot your password?
            </Link>
          </p>
        </form>
      ) : sentTo ? (
        <Alert tone="success">
          If an account exists for <strong>{sentTo}</strong>, a sign-in link is on its way. It works once, for 15 minutes.
        </Alert>
      ) : (
        <form onSubmit={onLink} noValidate className="space-y-4" aria-label="Sign in with an e-mailed link">
          <TextField id="link-email" label="E-mail" type="email" autoComplete="email" error={link.formState.errors.email?.message} {...link.register("email")} />
          <Button type="submit" className="w-full" busy={link.formState.isSubmitting}>
            E-mail me a sign-in link
          </Button>
        </form>
      )}

      <p className="border-t border-spruce-100 pt-4 text-center text-sm text-graphite-600">
        New here?{" "}
        <Link href={`/sign-up?callbackUrl=${encodeURIComponent(callbackUrl)}`} className="font-semibold text-rosewood-700 hover:underline">
          Create an account
        </Link>
      </p>
    </div>
  );
}
