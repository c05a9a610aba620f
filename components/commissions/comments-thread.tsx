"use client";

// The conversation between the client and the workshop on one commission.
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { lazyZodResolver } from "@/components/forms/lazy-schema";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { describedBy, Field } from "@/components/ui/field";
import { Textarea } from "@/components/ui/input";
import { ROLE_LABELS, isRole } from "@/lib/auth/permissions";
import { errorMessage } from "@/lib/http/api-client";
import type { commentSchema } from "@/lib/schemas/commission";
import { commissionPaths } from "./api-paths";
import { formatWhen } from "./format";
import { useComments } from "./queries";
import { Empty, Failed, Loading } from "./query-states";
import { applyApiErrors } from "./api-errors";
import { useCommissionChange } from "./use-commission-change";

const commentResolver = lazyZodResolver(() => import("@/lib/schemas/commission").then((m) => m.commentSchema));

type CommentInput = z.input<typeof commentSchema>;

export function CommentsThread({ slug, commissionId, me, isClient }: { slug: string; commissionId: number; me: number; isClient: boolean }) {
  const comments = useComments(slug, commissionId);
  const form = useForm<CommentInput>({ resolver: commentResolver, defaultValues: { body: "" } });
  const add = useCommissionChange<CommentInput>(slug, (v) => ({ path: commissionPaths(slug).comments(commissionId), json: v }));
  const error = form.formState.errors.body?.message;

  const submit = form.handleSubmit((values) =>
    add.mutateAsync(values).then(
      () => form.reset({ body: "" }),
      (err) => applyApiErrors(err, form.setError, ["body"]),
    ),
  );

  return (
    <div className="space-y-4">
      {comments.isPending ? (
        <Loading label="Loading comments…" rows={2} />
      ) : comments.isError ? (
        <Failed what="The comments" error={comments.error} retry={() => comments.refetch()} />
      ) : comments.data.length === 0 ? (
        <Empty>{isClient ? "No messages yet. Ask the workshop anything about your instrument here." : "No messages yet. The client sees everything written here."}</Empty>
      ) : (
        <ol aria-label="Comments" className="space-y-3">
          {comments.data.map((c) => (
            <li key={c.id} className={c.author.id === me ? "ml-6 rounded-panel bg-rosewood-50 px-3 py-2" : "mr-6 rounded-panel bg-spruce-50 px-3 py-2"}>
              <p className="flex flex-wrap items-center gap-2 text-xs text-graphite-600">
                <span className="font-semibold text-graphite-900">{c.author.name}</span>
                {c.author.role && isRole(c.author.role) ? <Badge>{ROLE_LABELS[c.author.role]}</Badge> : null}
                <time dateTime={c.createdAt}>{formatWhen(c.createdAt)}</time>
              </p>
              <p className="mt-1 whitespace-pre-wrap break-words text-sm">{c.body}</p>
            </li>
          ))}
        </ol>
      )}
      <form onSubmit={submit} noValidate aria-label="Write a comment" className="space-y-2">
        <Field id="comment-body" label={isClient ? "Message to the workshop" : "Message to the client"} error={error}>
          <Textarea id="comment-body" maxLength={4000} {...describedBy("comment-body", error)} {...form.register("body")} />
        </Field>
        {add.isError && !error ? <Alert tone="error">{errorMessage(add.error)}</Alert> : null}
        <Button type="submit" busy={form.formState.isSubmitting}>
          Send
        </Button>
      </form>
    </div>
  );
}
