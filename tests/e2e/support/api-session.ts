import { request, type APIRequestContext } from "@playwright/test";
import { demo } from "./auth";

/** An API-only client signed in through next-auth's credentials flow, like the sign-in form does. */
export async function apiSession(baseURL: string, email: string, password = demo.password): Promise<APIRequestContext> {
  const context = await request.newContext({ baseURL });
  const csrf = (await (await context.get("/api/auth/csrf")).json()) as { csrfToken: string };
  const response = await context.post("/api/auth/callback/password", {
    form: { csrfToken: csrf.csrfToken, email, password, json: "true" },
  });
  if (!response.ok()) throw new Error(`sign-in for ${email} answered ${response.status()}`);
  return context;
}
