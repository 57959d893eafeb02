import { z } from "zod";
import { oneTimeTokenPattern, signInSchema } from "@/lib/validations/members";

/**
 * The forms next-auth's endpoints take by POST, as the next-auth client (`signIn`) and our sign-out
 * button send them: the credentials, next-auth's CSRF token, and its `callbackUrl`, `json` and
 * `redirect` options. Strict, so a misspelt or extra field is refused (400 naming it) before next-auth
 * reads the body; next-auth still checks the CSRF token's value and the callback address itself.
 */

/** next-auth 4 makes its CSRF token from 32 random bytes, in hex. */
const csrfToken = z
  .string({ error: "Send next-auth's CSRF token (GET /api/auth/csrf)." })
  .regex(/^[0-9a-f]{64}$/, { error: "Not a CSRF token from GET /api/auth/csrf: reload the page and try again." });

const options = {
  csrfToken,
  // window.location.href by default: the sign-in page's address, whose own callbackUrl can be long.
  callbackUrl: z.string().max(8000, { error: "Too long for an address in this app." }).optional(),
  json: z.literal("true", { error: 'Only "true" (answer with JSON).' }).optional(),
  redirect: z.enum(["true", "false"], { error: 'Only "true" or "false".' }).optional(),
};

/** POST /api/auth/callback/password: the sign-in form's fields (the same rules) and next-auth's. */
export const passwordSignInFormSchema = z.strictObject({ ...signInSchema.shape, ...options });

/** The one-time sign-in link's token: 32 random bytes, base64url (lib/auth/tokens.ts). */
export const linkSignInFormSchema = z.strictObject({
  token: z.string({ error: "Send the token from the sign-in link." }).regex(oneTimeTokenPattern, {
    error: "Not a sign-in link token: copy the whole link from the e-mail.",
  }),
  ...options,
});

/** POST /api/auth/signout. */
export const signOutFormSchema = z.strictObject({ csrfToken, callbackUrl: options.callbackUrl, json: options.json });

/**
 * The POST actions Slipway uses, by path under /api/auth/. Everything else next-auth could take by POST
 * (e-mail or OAuth sign-in, session updates) is not configured here and is answered 404.
 */
export const authPostForms = {
  "callback/password": passwordSignInFormSchema,
  "callback/link": linkSignInFormSchema,
  signout: signOutFormSchema,
} as const;

export type AuthPostAction = keyof typeof authPostForms;

export function isAuthPostAction(path: string): path is AuthPostAction {
  return Object.hasOwn(authPostForms, path);
}

/**
 * The GET actions Slipway uses: the session, the CSRF token and the provider list (read by next-auth's
 * client), and sign-in and error, which next-auth sends on to /sign-in. next-auth's own HTML pages
 * (sign-out, verify-request) and the OAuth callbacks are not served (404).
 */
export const authGetActions: ReadonlySet<string> = new Set(["session", "csrf", "providers", "signin", "error"]);

/** A sign-in form is a few hundred bytes; the limit leaves room for a long callbackUrl, encoded. */
export const maxAuthFormBytes = 32 * 1024;
