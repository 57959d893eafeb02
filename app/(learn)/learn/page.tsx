import type { Metadata } from "next";
import { PageTitle } from "@/components/ui/page-title";
import { requirePageActor } from "@/lib/auth/session";
import { ClearanceSummary } from "@/components/certify/clearance-summary";

export const metadata: Metadata = { title: "Learn" };

export default async function LearnPage() {
  const actor = await requirePageActor("member", "/learn");
  return (
    <div>
      <PageTitle lead="Your modules, what is next and what waits for a coach.">Hello, {actor.name.split(" ")[0]}</PageTitle>
      <p data-testid="learn-page">The course modules appear here.</p>
      <div className="mt-6">
        <ClearanceSummary actor={actor} />
      </div>
    </div>
  );
}
