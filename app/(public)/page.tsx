import Link from "next/link";
import { buttonClasses } from "@/components/ui/button-classes";

export default function LandingPage() {
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold tracking-tight text-river-900">Set your own oars, safely.</h1>
      <p className="text-lg text-slate-800">
        Slipway is your club&apos;s short course on looking after adjustable oars: measuring overall length, setting the inboard with the
        collar, changing boats, securing everything before you go afloat, and keeping grips clean. Read a lesson on your phone, work through
        a practical quiz, and ask a coach to watch you do it for real.
      </p>
      <ul className="list-disc space-y-1 pl-6 text-slate-800">
        <li>Athletes: lessons, quizzes and your certificates.</li>
        <li>Coaches: who may rig unsupervised, and who is waiting for your sign-off.</li>
        <li>Club administrators: members, settings and the induction register for printing.</li>
      </ul>
      {/* /home sends a signed-in member to their own start page and everyone else to sign-in, so this
          page stays static and never offers "Sign in" to someone who already is. */}
      <Link href="/home" className={buttonClasses("primary")}>
        Open Slipway
      </Link>
    </div>
  );
}
