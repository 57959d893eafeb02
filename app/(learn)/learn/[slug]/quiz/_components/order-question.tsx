"use client";

import type { Choice } from "@/lib/quiz/types";

/** Put steps in order with Move up / Move down buttons: works by keyboard and with a screen reader. */
export function OrderQuestion({ choices, value, onChange }: { choices: Choice[]; value: string[]; onChange: (next: string[]) => void }) {
  const ordered = value.length === choices.length ? value : choices.map((choice) => choice.id);
  const labelOf = (id: string) => choices.find((choice) => choice.id === id)?.label ?? id;
  const move = (index: number, delta: -1 | 1) => {
    const next = [...ordered];
    const target = index + delta;
    if (target < 0 || target >= next.length) return;
    [next[index], next[target]] = [next[target]!, next[index]!];
    onChange(next);
  };
  return (
    <ol className="space-y-2">
      {ordered.map((id, index) => (
        <li key={id} className="flex min-h-11 items-center gap-2 rounded-md border border-slate-300 px-3 py-2">
          <span className="w-6 shrink-0 font-semibold text-slate-600">{index + 1}.</span>
          <span className="flex-1">{labelOf(id)}</span>
          <button
            type="button"
            onClick={() => move(index, -1)}
            disabled={index === 0}
            aria-label={`Move "${labelOf(id)}" up`}
            className="min-h-11 min-w-11 rounded border border-slate-400 font-bold disabled:opacity-40"
          >
            ↑
          </button>
          <button
            type="button"
            onClick={() => move(index, 1)}
            disabled={index === ordered.length - 1}
            aria-label={`Move "${labelOf(id)}" down`}
            className="min-h-11 min-w-11 rounded border border-slate-400 font-bold disabled:opacity-40"
          >
            ↓
          </button>
        </li>
      ))}
    </ol>
  );
}
