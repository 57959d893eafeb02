import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";
import { oneTimeTokenPattern } from "@/lib/validations/members";
import { ConfirmEmailButton } from "./_components/confirm-email-button";

export const metadata: Metadata = { title: "Confirm your new e-mail address", robots: { index: false, follow: false } };

/** The link mailed to a member's new address lands here; the button makes the change. */
export default async function ConfirmEmailPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await searchParams;
  return (
    <div className="mx-auto max-w-md">
      <PageTitle lead="From then on you sign in to Slipway with the address this link was sent to. The link works once.">
        Confirm your new e-mail address
      </PageTitle>
      {typeof token === "string" && oneTimeTokenPattern.test(token) ? (
        <ConfirmEmailButton token={token} />
      ) : (
        <Notice tone="error" title="This confirmation link is incomplete.">
          Copy the whole link from the e-mail, or ask for a new one under Your account.
        </Notice>
      )}
    </div>
  );
}
