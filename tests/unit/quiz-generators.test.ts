import { describe, expect, it } from "vitest";

import { cleaningDueState } from "@/lib/care/cleaning-due";
import { addDaysIso } from "@/lib/care/dates";
import { generators } from "@/lib/quiz/generators";
import { cleaningDueLabels } from "@/lib/quiz/generators/cleaning";
import { collarDirectionLabels } from "@/lib/quiz/generators/inboard";
import { lengthActionLabels } from "@/lib/quiz/generators/length";
import { limitCheckLabels } from "@/lib/quiz/generators/limits";
import { realisticCm } from "@/lib/quiz/generators/scenario";
import { gradeAnswer } from "@/lib/quiz/grade";
import { createRng } from "@/lib/quiz/random";
import { computedGeneratorNames } from "@/lib/quiz/recipe";
import type { Question, QuizSettings } from "@/lib/quiz/types";
import { inboardAfterLengthChangeCm, inboardClicks, lengthChange } from "@/lib/rigging/adjust";
import { leverRatio, outboardCm, overlapCm, spanGearing, suggestedInboardCm } from "@/lib/rigging/geometry";
import { checkLimits } from "@/lib/rigging/limits";
import type { OarType } from "@/lib/rigging/types";

const seedsPerGenerator = 200;
const settingsCases: QuizSettings[] = [
  { clickCm: 0.5, halfSwivelCm: 2 },
  { clickCm: 1, halfSwivelCm: 2.5 },
  { clickCm: 0.25, halfSwivelCm: 0 },
];

function build(name: (typeof computedGeneratorNames)[number], seed: number, settings: QuizSettings): Question {
  return generators[name](createRng(`test-${name}-${seed}`), settings);
}

/** Every question each generator makes for many seeds and each settings case. */
function sample(name: (typeof computedGeneratorNames)[number]): { question: Question; settings: QuizSettings }[] {
  const out: { question: Question; settings: QuizSettings }[] = [];
  for (let seed = 0; seed < seedsPerGenerator; seed += 1) {
    const settings = settingsCases[seed % settingsCases.length] as QuizSettings;
    out.push({ question: build(name, seed, settings), settings });
  }
  return out;
}

/** A wrong value of the right shape. */
function perturbed(question: Question): unknown {
  const { answer } = question;
  if (typeof answer === "number") return answer + (question.tolerance ?? 0) + 0.5;
  const ids = (question.choices ?? []).map((c) => c.id);
  if (typeof answer === "string") return ids.find((id) => id !== answer);
  if (question.kind === "multiple") {
    const wrongId = ids.find((id) => !answer.includes(id));
    return wrongId === undefined ? answer.slice(1) : [...answer, wrongId];
  }
  const swapped = [...answer];
  [swapped[0], swapped[1]] = [swapped[1] as string, swapped[0] as string];
  return swapped;
}

function num(prompt: string, pattern: RegExp): number {
  const match = pattern.exec(prompt);
  if (match?.[1] === undefined) throw new Error(`no ${pattern} in: ${prompt}`);
  return Number(match[1]);
}

function oarTypeOf(prompt: string): OarType {
  return /sweep oar/.test(prompt) ? "sweep" : "sculling";
}

function answerLabel(question: Question): string | undefined {
  return question.choices?.find((c) => c.id === question.answer)?.label;
}

function inRange(value: number, range: { min: number; max: number }): boolean {
  return value >= range.min && value <= range.max;
}

const n = "([\\d.]+)";

/** Recomputes each answer from the numbers in the prompt with a separate engine call. */
const independentChecks: Record<(typeof computedGeneratorNames)[number], (q: Question, s: QuizSettings) => void> = {
  "length-change": (q) => {
    const [measured, target] = [num(q.prompt, new RegExp(`measures ${n} cm`)), num(q.prompt, new RegExp(`asks for ${n} cm`))];
    expect(inRange(measured, realisticCm[oarTypeOf(q.prompt)].lengthCm)).toBe(true);
    expect(q.answer).toBeCloseTo(Math.abs(lengthChange(measured, target).changeCm), 9);
    expect(q.answer).toBeGreaterThan(0);
  },
  "length-direction": (q) => {
    const measured = num(q.prompt, new RegExp(`measures ${n} cm`));
    const target = num(q.prompt, new RegExp(`needs ${n} cm`));
    expect(answerLabel(q)).toBe(lengthActionLabels[lengthChange(measured, target).action]);
  },
  "inboard-after-handle-move": (q) => {
    const inboard = num(q.prompt, new RegExp(`inboard measures ${n} cm`));
    const move = num(q.prompt, new RegExp(`by ${n} cm by sliding`));
    const signed = /You lengthen/.test(q.prompt) ? move : -move;
    expect(inRange(inboard, realisticCm[oarTypeOf(q.prompt)].inboardCm)).toBe(true);
    expect(q.answer).toBe(inboardAfterLengthChangeCm(inboard, signed));
  },
  "inboard-clicks": (q, s) => {
    const current = num(q.prompt, new RegExp(`inboard measures ${n} cm`));
    const target = num(q.prompt, new RegExp(`wants ${n} cm`));
    const click = num(q.prompt, new RegExp(`collar ${n} cm`));
    expect(click).toBe(s.clickCm);
    const result = inboardClicks(current, target, click);
    expect(q.answer).toBe(result.clicks);
    expect(result.residualCm).toBe(0);
    expect(result.clicks).toBeGreaterThanOrEqual(1);
    expect(q.unit).toBe("clicks");
  },
  "click-direction": (q, s) => {
    const current = num(q.prompt, new RegExp(`inboard measures ${n} cm`));
    const target = num(q.prompt, new RegExp(`needs ${n} cm`));
    expect(answerLabel(q)).toBe(collarDirectionLabels[inboardClicks(current, target, s.clickCm).direction]);
  },
  outboard: (q) => {
    const length = num(q.prompt, new RegExp(`is ${n} cm long`));
    const inboard = num(q.prompt, new RegExp(`inboard of ${n} cm`));
    expect(q.answer).toBe(outboardCm(length, inboard));
  },
  "lever-ratio": (q) => {
    const length = num(q.prompt, new RegExp(`is ${n} cm long`));
    const inboard = num(q.prompt, new RegExp(`inboard of ${n} cm`));
    expect(Math.abs((q.answer as number) - leverRatio(length, inboard))).toBeLessThanOrEqual(0.005 + 1e-9);
  },
  "span-gearing": (q) => {
    const oarType = oarTypeOf(q.prompt);
    const length = num(q.prompt, new RegExp(`is ${n} cm long`));
    const inboard = num(q.prompt, new RegExp(`inboard of ${n} cm`));
    const spanOrSpread = num(q.prompt, new RegExp(`(?:span|spread) of ${n} cm`));
    expect(inRange(spanOrSpread, oarType === "sculling" ? realisticCm.spanCm : realisticCm.spreadCm)).toBe(true);
    expect(Math.abs((q.answer as number) - spanGearing(oarType, length, inboard, spanOrSpread))).toBeLessThanOrEqual(0.005 + 1e-9);
  },
  "overlap-sculling": (q, s) => {
    const inboard = num(q.prompt, new RegExp(`inboard of ${n} cm`));
    const span = num(q.prompt, new RegExp(`span is ${n} cm`));
    const halfSwivel = num(q.prompt, new RegExp(`half swivel width of ${n} cm`));
    expect(halfSwivel).toBe(s.halfSwivelCm);
    expect(q.answer).toBe(overlapCm("sculling", inboard, span, halfSwivel));
  },
  "overlap-sweep": (q, s) => {
    const inboard = num(q.prompt, new RegExp(`inboard of ${n} cm`));
    const spread = num(q.prompt, new RegExp(`spread is ${n} cm`));
    const halfSwivel = num(q.prompt, new RegExp(`half swivel width of ${n} cm`));
    expect(halfSwivel).toBe(s.halfSwivelCm);
    expect(q.answer).toBe(overlapCm("sweep", inboard, spread, halfSwivel));
  },
  "suggested-inboard-sweep": (q) => {
    const spread = num(q.prompt, new RegExp(`spread is ${n} cm`));
    expect(q.answer).toBe(suggestedInboardCm("sweep", spread));
    expect(q.answer).toBe(spread + 30); // rule of thumb: common practice, no source
  },
  "limit-check": (q) => {
    const match = new RegExp(`allows (sculls|sweep oars) from ${n} to ${n} cm long, with an inboard from ${n} to ${n} cm`).exec(q.prompt);
    const card = new RegExp(`says ${n} cm long with an inboard of ${n} cm`).exec(q.prompt);
    expect(match).not.toBeNull();
    expect(card).not.toBeNull();
    const [, noun, minL, maxL, minI, maxI] = match as RegExpExecArray;
    const limits = {
      minLengthCm: Number(minL),
      maxLengthCm: Number(maxL),
      minInboardCm: Number(minI),
      maxInboardCm: Number(maxI),
    };
    const settings = { lengthCm: Number(card?.[1]), inboardCm: Number(card?.[2]) };
    const fine = checkLimits(noun === "sculls" ? "sculling" : "sweep", settings, limits).length === 0;
    expect(answerLabel(q)).toBe(fine ? limitCheckLabels.fine : limitCheckLabels.askCoach);
  },
  "cleaning-due": (q) => {
    const today = "2026-09-01";
    let lastCleanedOn: string | null;
    if (/no record/.test(q.prompt)) lastCleanedOn = null;
    else if (/earlier today/.test(q.prompt)) lastCleanedOn = today;
    else if (/cleaned the handles of your oars yesterday/.test(q.prompt)) lastCleanedOn = addDaysIso(today, -1);
    else lastCleanedOn = addDaysIso(today, -num(q.prompt, /(\d+) days ago/));
    let raceDays: string[] = [];
    if (/race later today/.test(q.prompt)) raceDays = [today];
    else if (/race tomorrow/.test(q.prompt)) raceDays = [addDaysIso(today, 1)];
    else if (/race in \d+ days/.test(q.prompt)) raceDays = [addDaysIso(today, num(q.prompt, /race in (\d+) days/))];
    const humidSpell = /hot and humid/.test(q.prompt);
    const state = cleaningDueState({ lastCleanedOn, today, raceDays, humidSpell });
    expect(answerLabel(q)).toBe(state.due ? cleaningDueLabels.due : cleaningDueLabels.notDue);
  },
};

describe.each(computedGeneratorNames)("generator %s", (name) => {
  const questions = sample(name);

  it("is registered and names itself", () => {
    expect(typeof generators[name]).toBe("function");
    for (const { question } of questions) expect(question.generator).toBe(name);
  });

  it("always makes an answerable question with a worked explanation", () => {
    for (const { question } of questions) {
      expect(question.prompt.length).toBeGreaterThan(20);
      expect(question.prompt).not.toMatch(/undefined|NaN|Infinity|null|\[object/);
      expect(question.explanation).not.toMatch(/undefined|NaN|Infinity|null|\[object/);
      expect(question.explanation.trim().length).toBeGreaterThan(20);
      if (question.kind === "numeric") {
        expect(typeof question.answer).toBe("number");
        expect(Number.isFinite(question.answer)).toBe(true);
        expect(question.choices).toBeUndefined();
        // The explanation shows the numbers, including the answer.
        expect(question.explanation).toMatch(/\d/);
      } else {
        const ids = (question.choices ?? []).map((c) => c.id);
        expect(ids.length).toBeGreaterThanOrEqual(2);
        expect(new Set(ids).size).toBe(ids.length);
        const answerIds = Array.isArray(question.answer) ? question.answer : [question.answer];
        for (const id of answerIds) expect(ids).toContain(id);
      }
    }
  });

  it("grades its own answer right and a perturbed one wrong", () => {
    for (const { question } of questions) {
      expect(gradeAnswer(question, question.answer)).toBe(true);
      expect(gradeAnswer(question, perturbed(question))).toBe(false);
      expect(gradeAnswer(question, undefined)).toBe(false);
      if (typeof question.answer === "number") {
        expect(gradeAnswer(question, String(question.answer).replace(".", ","))).toBe(true);
      }
    }
  });

  it("agrees with an independent engine call on the scenario in the prompt", () => {
    for (const { question, settings } of questions) independentChecks[name](question, settings);
  });

  it("is deterministic for a seed and varies across seeds", () => {
    const settings = settingsCases[0] as QuizSettings;
    expect(build(name, 7, settings)).toEqual(build(name, 7, settings));
    const prompts = new Set(questions.map(({ question }) => question.prompt));
    expect(prompts.size).toBeGreaterThan(10);
  });
});

describe("answer spread", () => {
  it.each([
    ["length-direction", Object.values(lengthActionLabels)],
    ["click-direction", Object.values(collarDirectionLabels)],
    ["limit-check", Object.values(limitCheckLabels)],
    ["cleaning-due", Object.values(cleaningDueLabels)],
  ] as const)("%s has every answer come up", (name, labels) => {
    const seen = new Set(sample(name).map(({ question }) => answerLabel(question)));
    for (const label of labels) expect(seen).toContain(label);
  });

  it("length-change asks both lengthening and shortening", () => {
    const explanations = sample("length-change").map(({ question }) => question.explanation);
    expect(explanations.some((e) => /lengthen/.test(e))).toBe(true);
    expect(explanations.some((e) => /shorten/.test(e))).toBe(true);
  });
});
