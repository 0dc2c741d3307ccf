import "server-only";
import { headers } from "next/headers";
import { unstable_rethrow } from "next/navigation";
import type { ZodType } from "zod";
import type { ActionState } from "./action-state";
import { actorFor, type Access } from "./endpoint";
import { AppError, invalidInput, type FieldErrors } from "./errors";
import { toAppError } from "./handler";
import { consumeLimit } from "./rate-limit";
import type { KeyedLimit } from "./rate-limit-rules";
import { assertNoNul } from "./request-guards";
import type { Actor } from "@/lib/auth/queries";
import { forgetEverywhere } from "@/lib/cache/broadcast";
import { formInput, formValues, type FormShape } from "@/lib/forms/form-data";
import { clientAddress } from "@/lib/net/client-address";

// One declaration per server action, the form-side twin of endpoint(): who may
// call it, how the FormData becomes the same object the JSON route takes, the
// same zod schema, the same rate limits keyed the same way (the client address
// server.mjs worked out, or a value from the input), the same error mapping
// (toAppError) and the same cache clearing afterwards. The answer is an
// ActionState for useActionState, so a plain <form action={…}> works before
// (or without) JavaScript and nothing typed is lost on a refusal.
// Next itself refuses a server action whose Origin is not this host.

type ActorOf<A extends Access> = A extends "anyone" ? Actor | null : Actor;

export interface ActionSpec<A extends Access, I, P, R> extends FormShape {
  who: A;
  /** The same schema as the route's body. */
  schema: ZodType<I>;
  /** Hidden fields naming the record (an id, a slug), parsed like endpoint()'s path: a failure is 404. */
  params?: ZodType<P>;
  resource?: (actor: Actor, params: P) => Promise<R>;
  /** The route's own limits (one constant, lib/<domain>/limits.ts): a function gets the hidden fields as `params`, the input as `body`. */
  limits?: readonly KeyedLimit<P, I>[];
  keepsPeople?: boolean;
  /** Fields never echoed back into the page. */
  secret?: readonly string[];
}

export interface ActionContext<A extends Access, I, P, R> {
  actor: ActorOf<A>;
  input: I;
  params: P;
  resource: R;
  values: Record<string, string>;
}

export function action<A extends Access, I, T, P = undefined, R = undefined>(
  spec: ActionSpec<A, I, P, R>,
  work: (ctx: ActionContext<A, I, P, R>) => Promise<T>,
): (previous: unknown, formData: FormData) => Promise<ActionState<T>> {
  const secret = new Set(spec.secret ?? ["password"]);
  return async (_previous, formData) => {
    const values = formValues(formData);
    try {
      assertNoNul(values);
      const actor = (await actorFor(spec.who)) as ActorOf<A>;
      let params = undefined as P;
      if (spec.params) {
        const parsed = spec.params.safeParse(values);
        if (!parsed.success) throw new AppError("not_found", `${parsed.error.issues[0]?.message || "That record"} was not found.`);
        params = parsed.data;
      }
      const resource = spec.resource ? await spec.resource(actor as Actor, params) : (undefined as R);
      let numberErrors: FieldErrors = {};
      let raw: Record<string, unknown> = values;
      try {
        raw = formInput(values, spec);
      } catch (error) {
        numberErrors = (error as AppError).fields ?? {};
      }
      const parsed = spec.schema.safeParse(raw);
      // Every field's message at once: the number rule's words win for its boxes.
      if (!parsed.success || Object.keys(numberErrors).length) {
        const fields = { ...(parsed.success ? {} : invalidInput(parsed.error).fields), ...numberErrors };
        throw new AppError("invalid_input", "Some fields need another look.", { fields });
      }
      const input = parsed.data;
      const address = clientAddress(await headers());
      for (const limit of spec.limits ?? []) {
        const key = limit.by === "client" ? address : limit.by({ params, body: input });
        if (key) await consumeLimit(limit.rule, key.toLowerCase());
      }
      let data: Awaited<ReturnType<typeof work>>;
      try {
        data = await work({ actor, input, params, resource, values });
      } catch (error) {
        // A redirect() is how a done action answers, and a 5xx may follow a commit; a 4xx
        // refusal changed nothing and, as in endpoint(), tells no server to clear its cache.
        let nextAnswer = false; // redirect() and notFound() are Next's own throws: unstable_rethrow rethrows only those
        try {
          unstable_rethrow(error);
        } catch {
          nextAnswer = true;
        }
        const status = nextAnswer ? 0 : toAppError(error).status;
        if (status < 400 || status >= 500) await forgetEverywhere(spec.keepsPeople ? "data" : "all");
        throw error;
      }
      await forgetEverywhere(spec.keepsPeople ? "data" : "all");
      return { ok: true, message: null, fields: {}, values: {}, data };
    } catch (error) {
      unstable_rethrow(error); // redirect() and notFound() are answers, not failures
      const refused = toAppError(error);
      const kept = Object.fromEntries(Object.entries(values).filter(([k]) => !secret.has(k)));
      return { ok: false, message: refused.message, fields: refused.fields ?? {}, values: kept };
    }
  };
}
