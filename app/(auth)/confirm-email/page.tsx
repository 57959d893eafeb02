import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";
import { currentActor } from "@/lib/auth/session";
import { emailChangeLink, emailChangeLinkHours } from "@/lib/data/email-change";
import { oneTimeTokenPattern } from "@/lib/validations/members";
import { ConfirmEmailButton } from "./_components/confirm-email-button";

export const metadata: Metadata = { title: "Confirm your new e-mail address", robots: { index: false, follow: false } };

/**
 * The link mailed to a member's new address lands here; the button makes the change. A change the
 * member asked for is confirmed only while signed in as them, so a mistyped address's owner cannot.
 */
export default async function ConfirmEmailPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await searchParams;
  const wellFormed = typeof token === "string" && oneTimeTokenPattern.test(token);
  const link = wellFormed ? await emailChangeLink(token, await currentActor()) : null;
  const here = wellFormed ? `/confirm-email?token=${token}` : "/confirm-email";
  return (
    <div className="mx-auto max-w-md space-y-4">
      <PageTitle lead="From then on you sign in to Slipway with the address this link was sent to. The link works once.">
        Confirm your new e-mail address
      </PageTitle>
      {!wellFormed ? (
        <Notice tone="error" title="This confirmation link is incomplete.">
          Copy the whole link from the e-mail, or ask for a new one under Your account.
        </Notice>
      ) : !link ? (
        <Notice tone="error" title="This link is no longer valid.">
          It was used, replaced by a newer one, or is over {emailChangeLinkHours} hours old. Ask for a new one under Your account.
        </Notice>
      ) : link.needsMemberSignedIn && !link.signedInAsMember ? (
        <Notice tone="info" title={`Sign in as ${link.memberName} to confirm`} testId="confirm-email-sign-in">
          <p>
            This moves {link.memberName}&apos;s Slipway account to <span className="break-all">{link.newEmail}</span>. Only{" "}
            {link.memberName}, signed in with the address they use now, can confirm it. If that is not you, close this page: nothing
            changes.
          </p>
          <p className="mt-2">
            <Link href={`/sign-in?callbackUrl=${encodeURIComponent(here)}`} className="font-semibold underline">
              Sign in, then come back here
            </Link>
          </p>
        </Notice>
      ) : (
        <>
          <p>
            This moves {link.memberName}&apos;s Slipway account to <span className="break-all">{link.newEmail}</span>.
          </p>
          <ConfirmEmailButton token={token as string} />
        </>
      )}
    </div>
  );
}
