import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";
import { LinkSignInButton } from "../_components/link-sign-in-button";

export const metadata: Metadata = { title: "One-time sign-in" };

/** The link from the e-mail lands here; a button press uses it, so mail scanners cannot spend it. */
export default async function SignInLinkPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await searchParams;
  return (
    <div className="mx-auto max-w-md">
      <PageTitle lead="This link works once.">One-time sign-in</PageTitle>
      {typeof token === "string" && token.length > 10 ? (
        <LinkSignInButton token={token} />
      ) : (
        <Notice tone="error" title="This sign-in link is incomplete.">
          Copy the whole link from the e-mail, or ask for a new one on the sign-in page.
        </Notice>
      )}
    </div>
  );
}
