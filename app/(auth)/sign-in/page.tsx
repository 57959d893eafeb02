import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { PasswordSignInForm } from "./_components/password-sign-in-form";
import { SignInLinkForm } from "./_components/sign-in-link-form";
import { safeCallbackPath } from "@/lib/http/safe-redirect";
import { linkSessionGraceMinutes } from "@/lib/auth/password-rules";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const callbackUrl = safeCallbackPath(typeof params.callbackUrl === "string" ? params.callbackUrl : null);
  return (
    <div className="mx-auto max-w-md">
      <PageTitle lead="Use the e-mail address your club invited.">Sign in to Slipway</PageTitle>
      <section aria-labelledby="password-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="password-heading" className="mb-3 text-lg font-semibold">
          With your password
        </h2>
        <PasswordSignInForm callbackUrl={callbackUrl} />
      </section>
      <section aria-labelledby="link-heading" className="mt-6 rounded-lg bg-white p-4 shadow-sm">
        <h2 id="link-heading" className="mb-1 text-lg font-semibold">
          Or get a one-time link by e-mail
        </h2>
        <p className="mb-3 text-sm text-slate-700">
          Forgot your password? Sign in with a link, then choose a new one under Your account (your name at the top of the page) within{" "}
          {linkSessionGraceMinutes} minutes.
        </p>
        <SignInLinkForm />
      </section>
    </div>
  );
}
