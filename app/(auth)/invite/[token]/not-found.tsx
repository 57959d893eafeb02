import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";

/** An invitation link that no longer opens anything, answered 404. */
export default function InvitationNotFound() {
  return (
    <div className="mx-auto max-w-md">
      <PageTitle>Invitation</PageTitle>
      <Notice tone="error" title="This invitation link is no longer valid.">
        It may have been used already, replaced by a newer invitation or be more than 14 days old. Ask your club administrator for a new
        one, or{" "}
        <Link href="/sign-in" className="underline">
          sign in
        </Link>{" "}
        if you already have an account.
      </Notice>
    </div>
  );
}
