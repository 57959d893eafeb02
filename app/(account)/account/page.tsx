import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { currentSessionStart, requirePageActor } from "@/lib/auth/session";
import { linkSessionGraceMinutes, mayChangePasswordWithoutCurrent } from "@/lib/auth/password-rules";
import { roleLabels } from "@/lib/auth/roles";
import { clubOf } from "@/lib/data/members";
import { clubTimeZone } from "@/lib/data/club-settings";
import { emailChangeLinkHours, pendingEmailChange } from "@/lib/data/email-change";
import { formatInstantInZone } from "@/lib/care/calendar";
import { Notice } from "@/components/ui/notice";
import { ChangeNameForm } from "./_components/change-name-form";
import { ChangeEmailForm } from "./_components/change-email-form";
import { ChangePasswordForm } from "./_components/change-password-form";

export const metadata: Metadata = { title: "Your account" };

/** The signed-in member's own account: who they are to Slipway, and their password. */
export default async function AccountPage() {
  const actor = await requirePageActor("member", "/account");
  const [club, session, pending, timeZone] = await Promise.all([
    clubOf(actor),
    currentSessionStart(),
    pendingEmailChange(actor),
    clubTimeZone(actor.clubId),
  ]);
  const withoutCurrent = mayChangePasswordWithoutCurrent(session, new Date());
  return (
    <div className="mx-auto max-w-md space-y-6">
      <PageTitle lead="Your name as your club's records print it, the address you sign in with, and your password.">Your account</PageTitle>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg bg-white p-4 shadow-sm" data-testid="account-facts">
        <dt className="font-semibold">E-mail</dt>
        <dd className="break-all">{actor.email}</dd>
        <dt className="font-semibold">Role</dt>
        <dd>{roleLabels[actor.role]}</dd>
        <dt className="font-semibold">Club</dt>
        <dd>{club.name}</dd>
      </dl>
      <section aria-labelledby="name-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="name-heading" className="mb-3 text-lg font-semibold">
          Your name
        </h2>
        <ChangeNameForm name={actor.name} />
      </section>
      <section aria-labelledby="email-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="email-heading" className="mb-1 text-lg font-semibold">
          Change your e-mail address
        </h2>
        <p className="mb-3 text-sm text-slate-700">
          Slipway sends a link to the new address; once you open it (within {emailChangeLinkHours} hours) you sign in with that address, and
          every phone or computer is signed out. Until then nothing changes.
        </p>
        {pending && (
          <div className="mb-3">
            <Notice tone="info" title={`Waiting for you to open the link sent to ${pending.newEmail}`} testId="pending-email-change">
              It works until {formatInstantInZone(pending.expiresAt, timeZone)}. Asking again sends a new link and the earlier one stops
              working.
            </Notice>
          </div>
        )}
        <ChangeEmailForm withoutCurrent={withoutCurrent} />
      </section>
      <section aria-labelledby="password-heading" className="rounded-lg bg-white p-4 shadow-sm">
        <h2 id="password-heading" className="mb-1 text-lg font-semibold">
          Change your password
        </h2>
        <p className="mb-3 text-sm text-slate-700">
          {withoutCurrent
            ? `You signed in with an e-mail link, so for ${linkSessionGraceMinutes} minutes after that you can set a new password without the old one.`
            : "Forgot your current one? Sign out, ask for a one-time link on the sign-in page, and come back here within " +
              `${linkSessionGraceMinutes} minutes of using it.`}{" "}
          Changing it signs you out on every other phone or computer.
        </p>
        <ChangePasswordForm email={actor.email} withoutCurrent={withoutCurrent} />
      </section>
    </div>
  );
}
