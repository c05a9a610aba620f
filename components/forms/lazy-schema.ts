// The shared zod schemas, loaded when a form first needs them instead of with the page. zod and the
// resolver weigh about 50 kB gzipped; a page's first load stays within its budget (README,
// "First-load JavaScript") when they arrive on the first validation, a few milliseconds after the
// first keystroke or submit. The schema is still THE one of lib/schemas, shared with the server.
//
//   const resolver = lazyZodResolver(() => import("@/lib/schemas/auth").then((m) => m.passwordSignInSchema));
//   const form = useForm({ resolver, … });                  // define it once, outside the component
//   const refund = lazySchema(() => import("@/lib/schemas/payment").then((m) => m.refundRequestSchema));
//   const parsed = await refund.safeParse(input);           // in a submit handler
import type { FieldValues, Resolver } from "react-hook-form";
import type { z } from "zod";

type AnySchema = z.ZodType<unknown, unknown>;


/** Calls `load` once; a failed load (a network blip) is tried again next time. */
function once<T>(load: () => Promise<T>): () => Promise<T> {
  let pending: Promise<T> | undefined;
  return () => {
    pending ??= load().catch((err: unknown) => {
      pending = undefined;
      throw err;
    });
    return pending;
  };
}

export interface LazySchema<S> {
  /** The schema itself (loads it on the first call). */
  load(): Promise<S>;
  safeParse(input: unknown): Promise<z.ZodSafeParseResult<z.output<S>>>;
}

/** A schema loaded on first use, for forms that check values themselves before calling an action. */
export function lazySchema<S extends AnySchema>(load: () => Promise<S>): LazySchema<S> {
  const schema = once(load);
  return {
    load: schema,
    async safeParse(input) {
      return (await schema()).safeParse(input) as z.ZodSafeParseResult<z.output<S>>;
    },
  };
}

/**
 * react-hook-form's zod resolver with the schema and the resolver library imported on the first
 * validation. react-hook-form accepts an async resolver, so nothing else about the form changes.
 * Create it once per form (at module level), so the loaded resolver is kept between renders.
 */
export function lazyZodResolver<S extends AnySchema>(load: () => Promise<S>): Resolver<z.input<S> & FieldValues, unknown, z.output<S>> {
  const resolver = once(async () => {
    const [schema, { zodResolver }] = await Promise.all([load(), import("@hookform/resolvers/zod")]);
    return zodResolver(schema as never) as unknown as Resolver<z.input<S> & FieldValues, unknown, z.output<S>>;
  });
  return async (values, context, options) => (await resolver())(values, context, options);
}
