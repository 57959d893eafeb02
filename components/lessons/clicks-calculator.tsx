"use client";

import { useId, useState } from "react";
import { inboardClicks } from "@/lib/rigging/adjust";
import { describeClicks, evaluateClicksInput, formatCm, type ClicksField } from "@/components/lessons/lesson-format";
import { useHydrated } from "@/components/ui/use-hydrated";

export interface ClicksCalculatorProps {
  /** Starting value for the measured inboard; also used in the worked example. */
  defaultCurrentCm?: number;
  /** Starting value for the target inboard; also used in the worked example. */
  defaultTargetCm?: number;
  /** Collar travel a click; 0.5 cm on common collars, but clubs differ. */
  defaultClickCm?: number;
}

/** Works out how many collar clicks, and which way, take the inboard from its measured to its target value. */
export function ClicksCalculator({ defaultCurrentCm = 87, defaultTargetCm = 88, defaultClickCm = 0.5 }: ClicksCalculatorProps) {
  const id = useId();
  const hydrated = useHydrated();
  const [currentText, setCurrentText] = useState(formatCm(defaultCurrentCm));
  const [targetText, setTargetText] = useState(formatCm(defaultTargetCm));
  const [clickText, setClickText] = useState(formatCm(defaultClickCm));

  const example = inboardClicks(defaultCurrentCm, defaultTargetCm, defaultClickCm);
  const exampleDifferenceCm = Math.abs(example.changeCm);
  const exampleRatio = Number((exampleDifferenceCm / defaultClickCm).toFixed(2));
  const outcome = evaluateClicksInput(currentText, targetText, clickText);

  const fields: { name: ClicksField; label: string; value: string; set: (value: string) => void }[] = [
    { name: "current", label: "Measured inboard (cm)", value: currentText, set: setCurrentText },
    { name: "target", label: "Target inboard (cm)", value: targetText, set: setTargetText },
    { name: "click", label: "One click (cm)", value: clickText, set: setClickText },
  ];

  return (
    <section aria-labelledby={`${id}-heading`} className="my-6 rounded-lg border border-slate-300 bg-white p-4 text-slate-900">
      <h3 id={`${id}-heading`} className="text-lg font-semibold">
        Clicks calculator
      </h3>
      <p className="mt-2 text-base leading-7 text-slate-800">
        Worked example: you measure {formatCm(defaultCurrentCm)} cm and the target is {formatCm(defaultTargetCm)} cm. The difference is{" "}
        {formatCm(exampleDifferenceCm)} cm, and {formatCm(exampleDifferenceCm)} ÷ {formatCm(defaultClickCm)} = {formatCm(exampleRatio)}
        {exampleRatio === example.clicks ? "" : `, nearest whole number ${example.clicks}`}. So:{" "}
        {describeClicks(example, defaultClickCm).join(" ")}
      </p>

      <form className="mt-4 grid gap-4 sm:grid-cols-3" onSubmit={(event) => event.preventDefault()} noValidate>
        {fields.map((field) => {
          const inputId = `${id}-${field.name}`;
          const error = outcome.ok ? undefined : outcome.errors[field.name];
          return (
            <div key={field.name}>
              <label htmlFor={inputId} className="block text-sm font-semibold text-slate-900">
                {field.label}
              </label>
              <input
                id={inputId}
                name={field.name}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                value={field.value}
                disabled={!hydrated}
                onChange={(event) => field.set(event.target.value)}
                aria-invalid={error ? true : undefined}
                aria-describedby={error ? `${inputId}-error` : undefined}
                className="mt-1 block min-h-11 w-full rounded-md border border-slate-500 bg-white px-3 text-base text-slate-900 aria-invalid:border-alarm-600 aria-invalid:ring-2 aria-invalid:ring-alarm-600 disabled:bg-slate-100"
              />
              {error ? (
                <p id={`${inputId}-error`} className="mt-1 text-sm text-alarm-800">
                  <span className="font-semibold">Check this: </span>
                  {error}
                </p>
              ) : null}
            </div>
          );
        })}
      </form>

      <div
        role="status"
        aria-live="polite"
        className="mt-4 rounded-md border-l-4 border-river-600 bg-river-50 px-4 py-3 text-base leading-7 text-slate-900"
      >
        <p className="font-semibold">Result</p>
        {outcome.ok ? (
          describeClicks(outcome.result, outcome.clickCm).map((line) => <p key={line}>{line}</p>)
        ) : (
          <p>Fix the number marked “Check this” above to see the clicks.</p>
        )}
        <p className="mt-1 text-sm text-slate-700">Then seat the collar in its click, tighten it and measure the inboard again.</p>
      </div>
      <noscript>
        <p className="mt-3 text-sm text-slate-700">
          The calculator needs JavaScript to try your own numbers. The worked example above shows the same steps.
        </p>
      </noscript>
    </section>
  );
}
