import { addDaysIso, daysBetweenIso } from "@/lib/care/dates";
import { cleaningDueState, weeklyCleanDays } from "@/lib/care/cleaning-due";
import type { CleaningDueReason } from "@/lib/care/cleaning-due";
import { singleChoice } from "@/lib/quiz/choices";
import { question, type QuestionGenerator } from "@/lib/quiz/generators/scenario";
import { chance, pick, randomInt } from "@/lib/quiz/random";

export const cleaningDueLabels = {
  due: "Yes: clean them today",
  notDue: "No: they are not due yet",
} as const;

/** Race timing offered in scenarios, in days from today (null: no race coming up). */
const raceOffsets = [null, null, 0, 1, 1, 2, 4] as const;

/** A fixed first day keeps scenarios independent of the real date; only the gaps matter. */
const scenarioStartOn = "2026-04-06";

function daysAgoText(days: number): string {
  if (days === 0) return "earlier today";
  if (days === 1) return "yesterday";
  return `${days} days ago`;
}

function daysText(days: number): string {
  return days === 1 ? "1 day" : `${days} days`;
}

function raceText(offset: number | null): string {
  if (offset === null) return "You have no race coming up.";
  if (offset === 0) return "You race later today.";
  if (offset === 1) return "You race tomorrow.";
  return `You race in ${offset} days.`;
}

const reasonText: Record<CleaningDueReason, string> = {
  "never-cleaned": "There is no cleaning on record, so the handles are due now.",
  "over-7-days": `It has been ${weeklyCleanDays} days or more since the last clean, and handles are cleaned at least weekly.`,
  "race-day-next": "A race is coming and the handles have not been cleaned since the day before it: clean before every race.",
  "humid-spell": "In a hot, humid spell handles are cleaned every day, and they have not been cleaned today.",
  ok: "None of the rules applies yet.",
};

/** Whether handles are due a clean today, from days since cleaning, races and the weather. */
export const cleaningDueQuestion: QuestionGenerator = (rng) => {
  const today = addDaysIso(scenarioStartOn, randomInt(rng, 0, 180));
  const daysSinceCleaned = chance(rng, 0.08) ? null : randomInt(rng, 0, 9);
  const raceOffset = pick(rng, raceOffsets);
  const humidSpell = chance(rng, 0.3);
  const state = cleaningDueState({
    lastCleanedOn: daysSinceCleaned === null ? null : addDaysIso(today, -daysSinceCleaned),
    today,
    raceDays: raceOffset === null ? [] : [addDaysIso(today, raceOffset)],
    humidSpell,
  });
  const correct = state.due ? cleaningDueLabels.due : cleaningDueLabels.notDue;
  const wrong = state.due ? cleaningDueLabels.notDue : cleaningDueLabels.due;
  const { choices, answer } = singleChoice(rng, correct, [wrong]);
  const cleanedText =
    daysSinceCleaned === null
      ? "There is no record of you ever cleaning the handles of your oars."
      : `You last cleaned the handles of your oars ${daysAgoText(daysSinceCleaned)}.`;
  const weatherText = humidSpell ? "It has been hot and humid all week." : "The weather is cool and dry.";
  const nextNote =
    !state.due && state.nextDueOn !== null ? ` The next clean is due in ${daysText(daysBetweenIso(today, state.nextDueOn))}.` : "";
  return question("cleaning-due", {
    kind: "single",
    prompt: `${cleanedText} ${raceText(raceOffset)} ${weatherText} Are your handles due for a clean today?`,
    choices,
    answer,
    explanation:
      `Clean at least every ${weeklyCleanDays} days, before every race (the day before or the morning of it), ` +
      `and every day in hot, humid weather. ${reasonText[state.reason]}${nextNote}`,
  });
};
