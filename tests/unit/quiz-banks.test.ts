import { describe, expect, it } from "vitest";

import { bankQuestion, fixedBanks } from "@/lib/quiz/banks";
import { gradeAnswer } from "@/lib/quiz/grade";
import { createRng } from "@/lib/quiz/random";
import { fixedBankNames } from "@/lib/quiz/recipe";

const seeds = Array.from({ length: 60 }, (_, i) => `bank-seed-${i}`);

describe("fixedBanks", () => {
  it("has 2–4 variants for every bank name and nothing else", () => {
    expect(Object.keys(fixedBanks).sort()).toEqual([...fixedBankNames].sort());
    for (const name of fixedBankNames) {
      expect(fixedBanks[name].length).toBeGreaterThanOrEqual(2);
      expect(fixedBanks[name].length).toBeLessThanOrEqual(4);
    }
  });

  it("uses order questions for order: banks and written kinds elsewhere", () => {
    for (const name of fixedBankNames) {
      for (const variant of fixedBanks[name]) {
        if (name.startsWith("order:")) expect(variant.kind).toBe("order");
        else expect(["single", "multiple"]).toContain(variant.kind);
      }
    }
  });

  it("keeps the key facts (TRADE-FACTS procedure and grip care: common practice, no source; ICSC 1178)", () => {
    const text = JSON.stringify(fixedBanks);
    expect(text).toMatch(/blade, straight along the shaft, to the end of the handle/);
    expect(text).toMatch(/face of the collar that rests against the swivel/);
    expect(text).toMatch(/handles get swapped between oars/);
    expect(text).toMatch(/soft brass/);
    expect(text).toMatch(/never steel/);
    expect(text).toMatch(/sticky when wet/);
    expect(text).toMatch(/gloves and eye protection/);
    expect(text).toMatch(/never mix cleaners/);
    expect(text).toMatch(/Ask a coach before going afloat/);
  });

  it("puts length before inboard in every rig-change order", () => {
    for (const variant of fixedBanks["order:rig-change-steps"]) {
      if (variant.kind !== "order") throw new Error("order bank must hold order questions");
      const lengthStep = variant.steps.findIndex((s) => /overall length/.test(s) && /(Move|Set) the handle|at the handle/.test(s));
      const inboardStep = variant.steps.findIndex((s) => /collar/.test(s) && /(Move|Set)/.test(s));
      expect(lengthStep).toBeGreaterThanOrEqual(0);
      expect(inboardStep).toBeGreaterThan(lengthStep);
    }
  });
});

describe.each(fixedBankNames)("bank %s", (name) => {
  const questions = seeds.map((seed) => bankQuestion(name, createRng(seed)));

  it("makes answerable questions whose answer ids exist, with explanations", () => {
    for (const q of questions) {
      expect(q.generator).toBe(name);
      expect(q.explanation.length).toBeGreaterThan(20);
      expect(q.prompt).not.toMatch(/undefined|NaN/);
      const ids = (q.choices ?? []).map((c) => c.id);
      expect(new Set(ids).size).toBe(ids.length);
      const answerIds = Array.isArray(q.answer) ? q.answer : [q.answer];
      for (const id of answerIds) expect(ids).toContain(id);
      if (q.kind === "order") expect(answerIds).toHaveLength(ids.length);
      expect(gradeAnswer(q, q.answer)).toBe(true);
    }
  });

  it("grades a changed answer wrong", () => {
    for (const q of questions) {
      const ids = (q.choices ?? []).map((c) => c.id);
      if (q.kind === "single")
        expect(
          gradeAnswer(
            q,
            ids.find((id) => id !== q.answer),
          ),
        ).toBe(false);
      if (q.kind === "multiple" && Array.isArray(q.answer)) {
        expect(gradeAnswer(q, q.answer.slice(1))).toBe(false);
        const extra = ids.find((id) => !(q.answer as string[]).includes(id));
        if (extra !== undefined) expect(gradeAnswer(q, [...q.answer, extra])).toBe(false);
      }
      if (q.kind === "order" && Array.isArray(q.answer)) {
        expect(gradeAnswer(q, [...q.answer].reverse())).toBe(false);
        // Shown order is never already the right order.
        expect(ids).not.toEqual(q.answer);
      }
    }
  });

  it("chooses variants and shuffles choices by the seed", () => {
    expect(bankQuestion(name, createRng("same"))).toEqual(bankQuestion(name, createRng("same")));
    expect(new Set(questions.map((q) => q.prompt)).size).toBe(fixedBanks[name].length);
    const layouts = new Set(questions.map((q) => (q.choices ?? []).map((c) => c.label).join("|")));
    expect(layouts.size).toBeGreaterThan(fixedBanks[name].length);
  });

  it("gives a chosen variant on request", () => {
    fixedBanks[name].forEach((variant, index) => {
      expect(bankQuestion(name, createRng("v"), index).prompt).toBe(variant.prompt);
    });
  });
});
