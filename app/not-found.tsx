import Link from "next/link";

export default function NotFound() {
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold text-river-900">Not found</h1>
      <p>There is nothing at this address, or it is not yours to see.</p>
      <Link href="/home" className="font-semibold text-river-700 underline">
        Go to your start page
      </Link>
    </div>
  );
}
