import { cleaningCautions } from "@/lib/care/digest";

/** The grip-cleaning cautions, short, with the usual deference to the coach and local rules. */
export function CleaningCautions() {
  return (
    <section
      aria-labelledby="cautions-heading"
      className="rounded-md border-l-4 border-signal-600 bg-signal-100 p-3 text-slate-900"
      data-testid="cleaning-cautions"
    >
      <h2 id="cautions-heading" className="font-semibold">
        <span aria-hidden="true">! </span>Cleaning safely
      </h2>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {cleaningCautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
      <p className="mt-1 text-sm">If in doubt about a product or a grip, ask your coach first.</p>
    </section>
  );
}
