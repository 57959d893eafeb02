"use client";

import { useEffect, useRef, useState } from "react";
import type { Choice } from "@/lib/quiz/types";
import { orderMoveAnnouncement } from "@/lib/quiz/answered";

type Direction = "up" | "down";

/**
 * Put steps in order with Move up / Move down buttons: works by keyboard and with a screen reader. After
 * a move, focus stays on the moved step (on its other button when the step reached an end, where the
 * pressed one is disabled), and a polite live region says where the step is now.
 */
export function OrderQuestion({ choices, value, onChange }: { choices: Choice[]; value: string[]; onChange: (next: string[]) => void }) {
  const ordered = value.length === choices.length ? value : choices.map((choice) => choice.id);
  const labelOf = (id: string) => choices.find((choice) => choice.id === id)?.label ?? id;
  const buttons = useRef(new Map<string, HTMLButtonElement>());
  // The step just moved, until the render that shows it in its new place has put focus back on it.
  const moved = useRef<{ id: string; direction: Direction } | null>(null);
  const [announcement, setAnnouncement] = useState("");

  useEffect(() => {
    const pending = moved.current;
    if (!pending) return;
    const index = ordered.indexOf(pending.id);
    if (index === -1) return;
    moved.current = null;
    const atEnd = pending.direction === "up" ? index === 0 : index === ordered.length - 1;
    const direction = atEnd ? (pending.direction === "up" ? "down" : "up") : pending.direction;
    buttons.current.get(`${pending.id}:${direction}`)?.focus();
  });

  const move = (index: number, direction: Direction) => {
    const next = [...ordered];
    const target = index + (direction === "up" ? -1 : 1);
    if (target < 0 || target >= next.length) return;
    [next[index], next[target]] = [next[target]!, next[index]!];
    const id = ordered[index]!;
    moved.current = { id, direction };
    setAnnouncement(orderMoveAnnouncement(labelOf(id), target, next.length));
    onChange(next);
  };
  const register = (key: string) => (element: HTMLButtonElement | null) => {
    if (element) buttons.current.set(key, element);
    else buttons.current.delete(key);
  };

  return (
    <>
      <ol className="space-y-2">
        {ordered.map((id, index) => (
          <li key={id} className="flex min-h-11 items-center gap-2 rounded-md border border-slate-300 px-3 py-2">
            <span className="w-6 shrink-0 font-semibold text-slate-600">{index + 1}.</span>
            <span className="flex-1">{labelOf(id)}</span>
            <button
              type="button"
              ref={register(`${id}:up`)}
              onClick={() => move(index, "up")}
              disabled={index === 0}
              aria-label={`Move "${labelOf(id)}" up`}
              className="min-h-11 min-w-11 rounded border border-slate-400 font-bold disabled:opacity-40"
            >
              ↑
            </button>
            <button
              type="button"
              ref={register(`${id}:down`)}
              onClick={() => move(index, "down")}
              disabled={index === ordered.length - 1}
              aria-label={`Move "${labelOf(id)}" down`}
              className="min-h-11 min-w-11 rounded border border-slate-400 font-bold disabled:opacity-40"
            >
              ↓
            </button>
          </li>
        ))}
      </ol>
      <p role="status" aria-live="polite" className="sr-only" data-testid="order-announcement">
        {announcement}
      </p>
    </>
  );
}
