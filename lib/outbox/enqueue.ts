import { randomUUID } from "node:crypto";
import { insertOutboxMessage } from "@/lib/data/outbox";
import type { Trx } from "@/lib/data/transaction";
import { parseTemplateProps, subjectFor, type TemplateName, type TemplateProps } from "./templates";

export interface EnqueueEmail<T extends TemplateName> {
  /** The workshop the e-mail belongs to (its owner sees it if delivery fails); null for account mail. */
  workshopId: number | null;
  to: string;
  template: T;
  props: TemplateProps<T>;
}

/**
 * Writes an e-mail to the outbox inside `trx`, the transaction of the change that causes it: if
 * the change rolls back, no e-mail exists; if it commits, the worker delivers it (retrying with
 * backoff, under an idempotency key fixed now, so the provider never sends it twice).
 */
export async function enqueueEmail<T extends TemplateName>(trx: Trx, email: EnqueueEmail<T>): Promise<{ id: number; idempotencyKey: string }> {
  const props = parseTemplateProps(email.template, email.props);
  const idempotencyKey = `outbox-${randomUUID()}`;
  const id = await insertOutboxMessage(trx, {
    workshopId: email.workshopId,
    template: email.template,
    to: email.to,
    subject: subjectFor(email.template, props).slice(0, 200),
    props,
    idempotencyKey,
  });
  return { id, idempotencyKey };
}
