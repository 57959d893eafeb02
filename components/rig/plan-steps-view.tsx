import { Notice } from "@/components/ui/notice";
import { goingAfloatCautions, type PlanStep } from "@/components/rig/plan-steps";

interface PlanStepsViewProps {
  steps: PlanStep[];
  warnings: string[];
  /** "phone" when the server could not be reached and the browser worked the plan out itself. */
  source: "server" | "phone";
}

/** The numbered steps of a boat change, its warnings first, and the cautions before going afloat. */
export function PlanStepsView({ steps, warnings, source }: PlanStepsViewProps) {
  return (
    <section aria-labelledby="plan-heading" data-testid="rig-plan" className="space-y-4">
      <h2 id="plan-heading" className="text-xl font-semibold text-river-900">
        Your steps, in this order
      </h2>
      {source === "phone" && (
        <Notice tone="info" title="Worked out on this phone" testId="plan-offline">
          The server could not be reached, so this phone used the same rules with your club&apos;s limits as last loaded.
        </Notice>
      )}
      {warnings.length > 0 && (
        <Notice tone="warning" title="Ask your coach before going afloat" testId="plan-warnings">
          <ul className="list-disc space-y-1 pl-5">
            {warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
        </Notice>
      )}
      <ol className="space-y-3">
        {steps.map((step, index) => (
          <li key={step.key} data-testid={`step-${step.key}`} className="rounded-lg bg-white p-4 shadow-sm">
            <h3 className="font-semibold text-river-900">
              <span
                className="mr-2 inline-flex h-7 w-7 items-center justify-center rounded-full bg-river-700 text-sm text-white"
                aria-hidden="true"
              >
                {index + 1}
              </span>
              <span className="sr-only">Step {index + 1}: </span>
              {step.heading}
            </h3>
            <div className="mt-2 space-y-1 leading-7">
              {step.lines.map((line) => (
                <p key={line}>{line}</p>
              ))}
            </div>
          </li>
        ))}
      </ol>
      <Notice tone="warning" title="Before you go afloat" testId="plan-cautions">
        <ul className="list-disc space-y-1 pl-5">
          {goingAfloatCautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </Notice>
    </section>
  );
}
