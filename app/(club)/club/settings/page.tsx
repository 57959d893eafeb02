import type { Metadata } from "next";
import Link from "next/link";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { clubSettingsForAdmin } from "@/lib/data/club-admin-settings";
import { ClubSettingsFormView } from "./_components/club-settings-form";
import { LogoUpload } from "./_components/logo-upload";

export const metadata: Metadata = { title: "Club settings" };

/** The club's course settings and logo (admins). */
export default async function ClubSettingsPage() {
  const actor = await requirePageActor("admin", "/club/settings");
  const data = await clubSettingsForAdmin(actor);
  return (
    <div className="space-y-6">
      <PageTitle lead="Changes apply from now on: past quiz results keep their pass mark and certificates keep their dates.">
        {data.clubName}: settings
      </PageTitle>
      <ClubSettingsFormView initial={data.form} modules={data.modules} timeZones={data.timeZones} />
      <section aria-labelledby="logo-heading" className="space-y-3 rounded-lg bg-white p-4 shadow-sm">
        <h2 id="logo-heading" className="text-lg font-semibold">
          Club logo
        </h2>
        <LogoUpload hasLogo={data.hasLogo} />
      </section>
      <p>
        <Link href="/club" className="underline">
          Back to the club
        </Link>
      </p>
    </div>
  );
}
