import { describe, expect, it } from "vitest";
import { countAnswered, isAnswered, orderMoveAnnouncement } from "@/lib/quiz/answered";
import { readSavedAnswers, writeSavedAnswers } from "@/lib/quiz/saved-answers";
import type { PublicQuestion } from "@/lib/quiz/types";

const numeric: PublicQuestion = { id: "q1", kind: "numeric", prompt: "How many clicks?", unit: "clicks" };
const single: PublicQuestion = {
  id: "q2",
  kind: "single",
  prompt: "Which way?",
  choices: [
    { id: "a", label: "Towards the blade" },
    { id: "b", label: "Towards the handle" },
  ],
};
const multiple: PublicQuestion = {
  id: "q3",
  kind: "multiple",
  prompt: "Which do you check?",
  choices: [
    { id: "a", label: "The gate is shut" },
    { id: "b", label: "The collar sits in a click" },
  ],
};
const order: PublicQuestion = {
  id: "q4",
  kind: "order",
  prompt: "Put the steps in order.",
  choices: [
    { id: "a", label: "Tighten the collar" },
    { id: "b", label: "Loosen the collar" },
    { id: "c", label: "Measure again" },
  ],
};
const questions = [numeric, single, multiple, order];
const none = new Set<string>();

describe("which quiz questions count as answered", () => {
  it("counts typed, chosen and ticked answers, and not blank ones", () => {
    expect(isAnswered(numeric, "2", none)).toBe(true);
    expect(isAnswered(numeric, "   ", none)).toBe(false);
    expect(isAnswered(numeric, undefined, none)).toBe(false);
    expect(isAnswered(single, "b", none)).toBe(true);
    expect(isAnswered(single, "", none)).toBe(false);
    expect(isAnswered(multiple, ["a"], none)).toBe(true);
    expect(isAnswered(multiple, [], none)).toBe(false);
  });

  it("does not count an order question in its shown order until a step has been moved", () => {
    expect(isAnswered(order, ["a", "b", "c"], none)).toBe(false);
    expect(isAnswered(order, ["b", "a", "c"], none)).toBe(false);
    // Moved (even moved back to where it started) is a deliberate answer.
    expect(isAnswered(order, ["a", "b", "c"], new Set(["q4"]))).toBe(true);
  });

  it("counts over the attempt's questions only, ignoring saved answers to other ids", () => {
    const answers = { q1: "3", q2: "a", q3: [], q4: ["b", "a", "c"], stray: "9" };
    expect(countAnswered(questions, answers, none)).toBe(2);
    expect(countAnswered(questions, answers, new Set(["q4"]))).toBe(3);
    expect(countAnswered(questions, undefined, none)).toBe(0);
  });
});

describe("the answers kept in the browser", () => {
  it("reads back what it wrote, moved order questions included", () => {
    const saved = { answers: { q1: "3", q4: ["a", "b", "c"] }, movedOrders: ["q4"] };
    expect(readSavedAnswers(writeSavedAnswers(saved), questions)).toEqual(saved);
  });

  it("keeps a moved-and-moved-back order as moved", () => {
    const text = writeSavedAnswers({ answers: { q4: ["a", "b", "c"] }, movedOrders: ["q4"] });
    expect(readSavedAnswers(text, questions)?.movedOrders).toEqual(["q4"]);
  });

  it("reads a copy saved before the moved orders were kept: a changed order counts as moved, the shown one not", () => {
    const changed = JSON.stringify({ answers: { q1: "3", q4: ["b", "a", "c"] } });
    expect(readSavedAnswers(changed, questions)).toEqual({ answers: { q1: "3", q4: ["b", "a", "c"] }, movedOrders: ["q4"] });
    const shown = JSON.stringify({ answers: { q4: ["a", "b", "c"] } });
    expect(readSavedAnswers(shown, questions)?.movedOrders).toEqual([]);
  });

  it("drops ids that are not questions of this attempt, and moved ids that are not order questions", () => {
    const text = JSON.stringify({ answers: { q1: "3", gone: "x" }, movedOrders: ["q1", "gone"] });
    expect(readSavedAnswers(text, questions)).toEqual({ answers: { q1: "3" }, movedOrders: [] });
  });

  it.each([null, "", "not json", "[]", '{"answers": 3}', '{"answers": {"q1": 3}}', '{"answers": {}, "movedOrders": "q4"}'])(
    "ignores a missing or damaged copy: %j",
    (text) => {
      expect(readSavedAnswers(text, questions)).toBeNull();
    },
  );
});

describe("moving a step of an order question", () => {
  it("tells a screen reader the step's new place, counted from one", () => {
    expect(orderMoveAnnouncement("Loosen the handle", 0, 5)).toBe('"Loosen the handle" is now step 1 of 5.');
    expect(orderMoveAnnouncement("Check again", 4, 5)).toBe('"Check again" is now step 5 of 5.');
  });
});
