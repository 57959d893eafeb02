import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { Notice } from "@/components/ui/notice";
import { PracticalSignOffPanel } from "@/components/certify/practical-sign-off-panel";
import { CleaningCautions } from "@/components/rig/cleaning-cautions";
import { requirePageActor } from "@/lib/auth/session";
import { getModule } from "@/lib/content/modules";

export const metadata: Metadata = { title: "Practical sign-off" };

/** The athlete's practical for one module: what the coach watches, and asking for the sign-off. */
export default async function PracticalPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const actor = await requirePageActor("member", `/learn/${slug}/practical`);
  const lesson = getModule(slug);
  if (!lesson) notFound();
  return (
    <div className="space-y-6">
      <PageTitle lead={lesson.meta.summary}>Practical: {lesson.meta.title}</PageTitle>
      {lesson.meta.practicalCaution === "cleaning" ? (
        <CleaningCautions />
      ) : (
        <Notice tone="warning" title="Safety first">
          A collar that is not seated in a click, or a loose screw, can make an oar unrowable on the water. Until a coach signs you off,
          adjust oars only with a coach beside you, and always follow your club&apos;s rules and the coach on duty.
        </Notice>
      )}
      <PracticalSignOffPanel actor={actor} moduleSlug={slug} />
      <p>
        <Link href={`/learn/${slug}`} className="underline">
          Back to the lesson
        </Link>
        {" · "}
        <Link href="/learn" className="underline">
          All modules
        </Link>
      </p>
    </div>
  );
}
