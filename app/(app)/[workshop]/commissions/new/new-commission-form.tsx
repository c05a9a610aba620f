"use client";

// The new-commission form on react-hook-form with the shared commissionCreateSchema (the price is
// typed in major units here and turned into minor units before it is checked and sent); the
// schema (form-schema.ts) loads on the first validation.
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { commissionPaths } from "@/components/commissions/api-paths";
import { applyApiErrors } from "@/components/commissions/api-errors";
import { useCommissionPeople } from "@/components/commissions/queries";
import { Failed } from "@/components/commissions/query-states";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Input, Textarea } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { apiFetch, ApiError } from "@/lib/http/api-client";
import { parseMajor } from "@/lib/money/money";
import type { CommissionSummary } from "@/lib/schemas/commission-out";
import type { formSchema, Mode } from "./form-schema";

type FormIn = z.input<ReturnType<typeof formSchema>>;
type FormOut = z.output<ReturnType<typeof formSchema>>;

const FIELDS = ["title", "clientId", "builderId", "price", "depositPercent", "targetDate", "requestNotes"];
const emptyToUndefined = (v: unknown) => (v === "" || v === null ? undefined : v);

export function NewCommissionForm({ slug, mode, currency }: { slug: string; mode: Mode; currency: string }) {
  const router = useRouter();
  const resolver = useMemo(() => lazyZodResolver(() => import("./form-schema").then((m) => m.formSchema(mode, currency))), [mode, currency]);
  const form = useForm<FormIn, unknown, FormOut>({ resolver, defaultValues: { title: "", requestNotes: "", price: "" } });
  const people = useCommissionPeople(slug, mode === "request" ? null : "commission-people");
  const [formError, setFormError] = useState<string | null>(null);
  const create = useMutation({ mutationFn: (body: Record<string, unknown>) => apiFetch<{ commission: CommissionSummary }>(commissionPaths(slug).create, { json: body }) });
  const { errors } = form.formState;
  const err = (name: string) => (errors as Record<string, { message?: string } | undefined>)[name]?.message;

  const submit = form.handleSubmit(async (v) => {
    setFormError(null);
    const body: Record<string, unknown> = { title: v.title, requestNotes: v.requestNotes };
    if (mode !== "request") {
      body.clientId = v.clientId;
      if (v.targetDate) body.targetDate = v.targetDate;
    }
    if (mode === "owner") {
      if (v.builderId) body.builderId = v.builderId;
      if (v.price) body.priceMinor = parseMajor(v.price, currency)!.amountMinor;
      if (v.depositPercent !== undefined) body.depositPercent = v.depositPercent;
    }
    try {
      const { commission } = await create.mutateAsync(body);
      router.push(`/${slug}/commissions/${commission.id}`);
    } catch (e) {
      const renamed = e instanceof ApiError ? new ApiError(e.status, e.code, e.message, e.issues.map((i) => ({ ...i, path: i.path === "priceMinor" ? "price" : i.path }))) : e;
      setFormError(applyApiErrors(renamed, form.setError, FIELDS));
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label={mode === "request" ? "New request" : "New commission"} className="grid gap-4 sm:grid-cols-2">
      <Field id="new-title" label="Title" hint="e.g. Seven-string for drop tunings" error={err("title")} className="sm:col-span-2">
        <Input id="new-title" {...describedBy("new-title", err("title"))} {...form.register("title")} />
      </Field>
      {mode !== "request" ? (
        <>
          <Field id="new-client" label="Client" error={err("clientId")} hint={people.data && people.data.clients.length === 0 ? "No clients yet: invite one under Members first." : undefined}>
            <Select id="new-client" {...describedBy("new-client", err("clientId"))} {...form.register("clientId", { setValueAs: emptyToUndefined })}>
              <option value="">{people.isPending ? "Loading…" : "Choose…"}</option>
              {(people.data?.clients ?? []).map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                </option>
              ))}
            </Select>
          </Field>
          {mode === "owner" ? (
            <Field id="new-builder" label="Builder" error={err("builderId")}>
              <Select id="new-builder" {...describedBy("new-builder", err("builderId"))} {...form.register("builderId", { setValueAs: emptyToUndefined })}>
                <option value="">Assign later</option>
                {(people.data?.builders ?? []).map((p) => (
                  <option key={p.id} value={p.id}>
                    {p.name}
                  </option>
                ))}
              </Select>
            </Field>
          ) : (
            <p className="self-end pb-3 text-sm text-graphite-600">You will be its builder.</p>
          )}
          {people.isError ? (
            <div className="sm:col-span-2">
              <Failed what="The list of clients" error={people.error} retry={() => people.refetch()} />
            </div>
          ) : null}
          <Field id="new-target" label="Target date" hint="Optional" error={err("targetDate")}>
            <Input id="new-target" type="date" {...describedBy("new-target", err("targetDate"))} {...form.register("targetDate", { setValueAs: (v) => (v === "" ? null : v) })} />
          </Field>
        </>
      ) : null}
      {mode === "owner" ? (
        <>
          <Field id="new-price" label={`Price (${currency})`} hint="Can be set later, until the client approves a spec" error={err("price")}>
            <Input id="new-price" inputMode="decimal" {...describedBy("new-price", err("price"))} {...form.register("price")} />
          </Field>
          <Field id="new-deposit" label="Deposit (% of the price)" hint="Empty: the workshop's usual deposit" error={err("depositPercent")}>
            <Input id="new-deposit" inputMode="decimal" {...describedBy("new-deposit", err("depositPercent"))} {...form.register("depositPercent", { setValueAs: (v) => (v === "" ? undefined : Number(v)) })} />
          </Field>
        </>
      ) : null}
      <Field
        id="new-notes"
        label={mode === "request" ? "What you have in mind" : "Notes from the client"}
        hint={mode === "request" ? "Strings, scale, woods, finish, pickups, how you play: anything that helps." : "Optional"}
        error={err("requestNotes")}
        className="sm:col-span-2"
      >
        <Textarea id="new-notes" maxLength={4000} {...describedBy("new-notes", err("requestNotes"))} {...form.register("requestNotes")} />
      </Field>
      {formError ? (
        <Alert tone="error" className="sm:col-span-2">
          {formError}
        </Alert>
      ) : null}
      <div className="sm:col-span-2">
        <Button type="submit" busy={form.formState.isSubmitting}>
          {mode === "request" ? "Send the request" : "Open the commission"}
        </Button>
      </div>
    </form>
  );
}
