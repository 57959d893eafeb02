import Link from "next/link";

export default function Forbidden() {
  return (
    <div className="space-y-4" data-testid="forbidden">
      <h1 className="text-2xl font-bold text-river-900">Not for your role</h1>
      <p>This page is for coaches or club administrators. If you think you should see it, ask your club administrator.</p>
      <Link href="/home" className="font-semibold text-river-700 underline">
        Go to your start page
      </Link>
    </div>
  );
}
