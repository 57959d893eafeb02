import { multipleChoice, orderChoices, singleChoice } from "@/lib/quiz/choices";
import { pick } from "@/lib/quiz/random";
import type { FixedBankName, Question, Rng } from "@/lib/quiz/types";

/** One written question; choices are shuffled and given ids when it is asked. */
export type BankVariant =
  | { kind: "single"; prompt: string; correct: string; wrong: string[]; explanation: string }
  | { kind: "multiple"; prompt: string; correct: string[]; wrong: string[]; explanation: string }
  | { kind: "order"; prompt: string; steps: string[]; explanation: string };

/**
 * Written question banks, 2–4 variants each, in Slipway's own words. Facts from TRADE-FACTS.md:
 * definitions from the FISA 2006 World Championships Rigging Survey measurement protocol; procedure
 * and grip care are common practice; chemical safety from ICSC 1178 and the CDC cleaning pages.
 */
export const fixedBanks: Record<FixedBankName, BankVariant[]> = {
  "fact:measure-length": [
    {
      kind: "single",
      prompt: "Where do you measure an oar's overall length?",
      correct: "From the tip of the blade, straight along the shaft, to the end of the handle",
      wrong: [
        "From the tip of the blade to the collar",
        "From the end of the handle to the collar",
        "From the collar to the middle of the grip",
      ],
      explanation:
        "Overall length runs in a straight line along the shaft from the blade tip to the very end of the handle. Blade tip to collar is the outboard; handle end to collar is the inboard.",
    },
    {
      kind: "multiple",
      prompt: "Which of these are part of measuring overall length properly? Choose all that apply.",
      correct: [
        "Hold the end of the tape at the tip of the blade",
        "Keep the tape straight along the shaft",
        "Read the tape at the very end of the handle",
      ],
      wrong: ["Read the tape at the collar", "Use the number printed on the handle instead of a tape"],
      explanation:
        "The tape starts at the blade tip, runs straight along the shaft and is read at the end of the handle. The collar marks the inboard, not the length, and printed numbers can belong to another oar.",
    },
    {
      kind: "single",
      prompt: "You hold the tape at the blade tip and read 200 cm at the collar. What have you measured?",
      correct: "The outboard, not the overall length",
      wrong: ["The overall length", "The inboard", "The span"],
      explanation:
        "Blade tip to collar is the outboard. For the overall length, carry the tape on along the shaft to the end of the handle.",
    },
  ],
  "fact:handle-mechanisms": [
    {
      kind: "single",
      prompt: "On adjustable-handle sculls and oars, what are the two usual ways the handle is held in place?",
      correct: "Clamped by screws and slid along the shaft, or wound in and out by a screw in the end of the handle",
      wrong: [
        "Glued in, so only a boatbuilder can change it",
        "Held only by the grip rubber pressing on the shaft",
        "Held by the collar, so moving the collar moves the handle",
      ],
      explanation:
        "Most adjustable handles are either clamped by screws (loosen, slide, tighten) or wound in and out by a screw in the handle end. The collar is separate and sets the inboard.",
    },
    {
      kind: "single",
      prompt: "The handle of your oar has a screw in its very end. How do you change the overall length?",
      correct: "Turn the screw in the end to wind the handle in or out",
      wrong: [
        "Loosen the collar screws and slide the collar",
        "Pull the handle out by hand without touching the screw",
        "Cut the end of the handle off",
      ],
      explanation:
        "A handle with a screw in its end is wound in or out by turning that screw. Moving the collar changes the inboard, not the overall length.",
    },
    {
      kind: "single",
      prompt: "Your handle is held by clamping screws. How do you move it?",
      correct: "Loosen the clamp screws, slide the handle, then tighten the screws again",
      wrong: [
        "Slide it with the screws still tight",
        "Take the screws out and leave them out so it is easier next time",
        "Tap it along with a hammer",
      ],
      explanation: "A clamped handle only moves when its screws are loose, and it must be clamped tight again before the oar is used.",
    },
  ],
  "fact:stub-markings": [
    {
      kind: "single",
      prompt: "The handle of your oar has a mark labelled 288. Can you set the oar by that mark alone?",
      correct: "No: handles get swapped between oars, so measure the whole oar with a tape",
      wrong: ["Yes: the marks are made for each oar when it is built", "Yes, as long as the mark is easy to read", "Only on sweep oars"],
      explanation:
        "Handles are swapped between oars, so a mark on a handle may have been made for a different shaft. Measure from the blade tip to the handle end every time.",
    },
    {
      kind: "single",
      prompt: "Why can the length marks on a handle be wrong for the oar it is on?",
      correct: "The handle may have come from another oar, so its marks were made for a different shaft",
      wrong: [
        "The marks move as the handle warms up in the sun",
        "Marks are only ever put on sweep oars",
        "Marks are always right; they cannot be wrong",
      ],
      explanation:
        "Handles get swapped between oars. A mark only tells you about the shaft it was made for, so trust the tape, not the mark.",
    },
    {
      kind: "multiple",
      prompt: "Which are good habits when setting overall length? Choose all that apply.",
      correct: ["Measure from the blade tip to the handle end with a tape", "Measure again after every change"],
      wrong: ["Set the handle to the printed mark and skip the tape", "Copy the setting from the oar next to yours without measuring"],
      explanation:
        "Marks on a handle may belong to another oar and neighbouring oars can differ, so measure with a tape and measure again after each change.",
    },
  ],
  "fact:inboard-definition": [
    {
      kind: "single",
      prompt: "What is the inboard of an oar?",
      correct: "The distance from the end of the handle to the face of the collar that rests against the swivel",
      wrong: [
        "The distance from the collar to the blade tip",
        "The distance from the end of the handle to the handle-side edge of the collar",
        "The length of the grip rubber",
      ],
      explanation:
        "Inboard runs from the end of the handle to the blade-side face of the collar, the face that presses against the swivel when you row.",
    },
    {
      kind: "single",
      prompt: "When you measure the inboard, which face of the collar does the tape go to?",
      correct: "The blade-side face, the one that rests against the swivel",
      wrong: ["The handle-side face", "The middle of the collar", "Either face: it makes no difference"],
      explanation:
        "The inboard stops at the face of the collar that rests against the swivel, on the blade side. Measuring to the other face adds the collar's width by mistake.",
    },
  ],
  "fact:collar-seated": [
    {
      kind: "single",
      prompt: "You have moved the collar three clicks. What must be true before you carry on?",
      correct: "It sits fully in a click and its screws are tight",
      wrong: [
        "It can sit between two clicks if the tape reads right",
        "Its screws can stay loose so it settles while you row",
        "It only needs to be finger tight for short outings",
      ],
      explanation:
        "A collar must sit in a click with its screws done up tight. A collar between clicks or with loose screws can slip, and an oar with a slipped collar cannot be rowed.",
    },
    {
      kind: "multiple",
      prompt: "Which checks show a collar is ready for rowing? Choose all that apply.",
      correct: ["It sits in a click, not between two", "Its screws are tight", "The inboard measures what you set"],
      wrong: ["It spins freely around the shaft", "One screw has been left out to save time"],
      explanation:
        "Seated in a click, screws tight, and the inboard measured again: then the collar will hold. A loose or spinning collar can slip.",
    },
  ],
  "fact:span-spread": [
    {
      kind: "single",
      prompt: "What is the span of a sculling boat?",
      correct: "The distance between the centres of the two pins",
      wrong: [
        "The distance from the boat's centre line to one pin",
        "The width of the boat at the seat",
        "The distance between the two collars",
      ],
      explanation:
        "Span is measured from the centre of one pin to the centre of the other. Sweep boats use spread instead: centre line to pin.",
    },
    {
      kind: "single",
      prompt: "What is the spread of a sweep boat?",
      correct: "The distance from the boat's centre line to the centre of the pin",
      wrong: [
        "The distance between the pins on both sides of the boat",
        "The length of the rigger",
        "The distance from the pin to the collar",
      ],
      explanation:
        "Spread runs from the boat's centre line to the centre of the pin. Sculling boats use span instead: pin centre to pin centre.",
    },
    {
      kind: "single",
      prompt: "You move from a sculling boat to a sweep boat. Which figure tells you how far out the pin is?",
      correct: "Spread: from the boat's centre line to the centre of the pin",
      wrong: ["Span: from one pin centre to the other", "Inboard: from the handle end to the collar"],
      explanation:
        "Sweep boats are set by spread (centre line to pin centre). Span (pin to pin) is for sculling boats, and inboard belongs to the oar.",
    },
  ],
  "fact:why-length-first": [
    {
      kind: "single",
      prompt: "Why do you set the overall length before the inboard?",
      correct: "Moving the handle also moves the handle end, and that changes the inboard",
      wrong: [
        "The collar can only be moved when the handle is taken off",
        "It does not matter which you set first",
        "Moving the collar changes the overall length",
      ],
      explanation:
        "The inboard is measured from the handle end. Move the handle and the handle end moves too, so any inboard set before it would be lost.",
    },
    {
      kind: "single",
      prompt: "You set the inboard exactly right, then lengthen the oar by 1 cm at the handle. What has happened to the inboard?",
      correct: "It has grown by 1 cm, so it must be set again",
      wrong: ["Nothing, because the collar did not move", "It has shrunk by 1 cm", "It has grown by 2 cm"],
      explanation:
        "The handle end moved 1 cm further from the collar, so the inboard is now 1 cm longer. Set the length first, then the inboard.",
    },
  ],
  "fact:ask-a-coach": [
    {
      kind: "single",
      prompt: "The setting on the rig card is outside your club's limits. What do you do?",
      correct: "Ask a coach before going afloat",
      wrong: ["Set it anyway: the card must be right", "Set it to the nearest limit and go out", "Keep the old setting and say nothing"],
      explanation:
        "A figure outside the club's limits may be a mistake or a special setting. Only a coach can say which, so ask before going afloat.",
    },
    {
      kind: "single",
      prompt: "Halfway through a change you are not sure which way the collar should move. What is the right thing to do?",
      correct: "Stop and ask a coach before going afloat",
      wrong: ["Guess, and check after the outing", "Leave the collar loose and go out", "Copy whatever the next oar looks like"],
      explanation:
        "When in doubt, ask a coach before going afloat. A wrong guess or a loose collar can spoil the outing or make the oar unrowable.",
    },
  ],
  "fact:slipped-collar": [
    {
      kind: "single",
      prompt: "What happens if a collar slips along the shaft during an outing?",
      correct: "The oar becomes unrowable",
      wrong: [
        "Nothing: the swivel holds the oar in place anyway",
        "The oar just gets a little lighter to row",
        "Only the grip gets slippery",
      ],
      explanation:
        "The collar is what holds the oar's position in the swivel. Once it slips, the oar cannot be rowed properly, so collars sit in a click with their screws tight.",
    },
    {
      kind: "single",
      prompt: "Why must the collar's screws be tight before you go afloat?",
      correct: "A collar that slips makes the oar unrowable",
      wrong: [
        "Tight screws make the oar lighter",
        "So the collar can be moved while you row",
        "They do not need to be tight if the collar is in a click",
      ],
      explanation: "A collar that is not in a click with tight screws can slip, and a slipped collar leaves the oar unrowable.",
    },
  ],
  "fact:pre-launch-checks": [
    {
      kind: "multiple",
      prompt: "You have just changed your oar's settings. Which checks do you make before going afloat? Choose all that apply.",
      correct: [
        "Measure the overall length and the inboard again",
        "Check each collar sits in a click with its screws tight",
        "Check the settings are inside the club's limits",
      ],
      wrong: ["Skip the checks because you used the same oar yesterday", "Loosen the collar a little so it can settle"],
      explanation:
        "After any change: measure again, make sure the collars are seated with tight screws, and check the figures are inside the club's limits. Then go afloat.",
    },
    {
      kind: "single",
      prompt: "You have finished a rig change. What comes next?",
      correct: "Check everything again before going afloat",
      wrong: ["Carry the oar straight to the water", "Ask a friend to try it on the water first", "Nothing: the change is finished"],
      explanation:
        "Every change ends with a check: length, inboard, collars seated and tight, figures inside the club's limits. Only then go afloat.",
    },
  ],
  "fact:brush-type": [
    {
      kind: "single",
      prompt: "What do you scrub rubber handle grips with?",
      correct: "A soft brass wire brush or a pot scourer",
      wrong: ["A steel wire brush", "A sheet of sandpaper", "A knife blade"],
      explanation: "Club practice is a soft brass brush or a pot scourer, never steel, with a mild alkaline cleaner, then a rinse.",
    },
    {
      kind: "single",
      prompt: "A friend offers you a steel wire brush to clean your grips. What do you say?",
      correct: "No thanks: grips are scrubbed with soft brass or a pot scourer, never steel",
      wrong: ["Yes: the harder the brush, the cleaner the grip", "Yes, as long as the grip is wet", "Yes, but only once a season"],
      explanation: "Use a soft brass brush or a pot scourer on grips. Never use steel.",
    },
  ],
  "fact:cleaning-frequency": [
    {
      kind: "multiple",
      prompt: "When should you clean your oar handles? Choose all that apply.",
      correct: ["At least once a week", "Before every race", "Every day in hot, humid weather"],
      wrong: ["Only when they look dirty", "Once a season"],
      explanation:
        "Handles are cleaned at least weekly, before every race, and every day while the weather is hot and humid. Germs spread on shared equipment even when it looks clean.",
    },
    {
      kind: "single",
      prompt: "It has been hot and humid all week. How often do you clean your handles?",
      correct: "Every day",
      wrong: ["Once a week as usual", "Only before races", "Never while it is hot"],
      explanation: "In hot, humid weather handles are cleaned daily, on top of the weekly and before-race cleans.",
    },
    {
      kind: "single",
      prompt: "You cleaned your handles four days ago and race tomorrow. Do you clean them today?",
      correct: "Yes: handles are cleaned before every race",
      wrong: ["No: it has not been a week yet", "No: clean them after the race instead"],
      explanation: "The weekly clean is a minimum. Before a race you clean them again, whatever the day count.",
    },
  ],
  "fact:sticky-when-wet": [
    {
      kind: "single",
      prompt: "How can you tell a rubber handle grip is properly clean?",
      correct: "It feels sticky when wet",
      wrong: ["It feels slippery when wet", "It looks shiny", "It smells of cleaner"],
      explanation: "A clean grip feels sticky, not slippery, when it is wet. A slippery grip still has dirt or grease on it.",
    },
    {
      kind: "single",
      prompt: "After scrubbing and rinsing, the grip still feels slippery when wet. What does that tell you?",
      correct: "It is not clean yet: scrub and rinse it again",
      wrong: [
        "It is clean: clean grips feel slippery",
        "The brush was too soft, so switch to a steel one",
        "The grip is worn out and must be thrown away",
      ],
      explanation:
        "Clean grips feel sticky when wet. Slippery means there is still dirt or grease, so scrub again with the soft brass brush and rinse.",
    },
  ],
  "fact:chemical-safety": [
    {
      kind: "multiple",
      prompt: "You are cleaning grips with a trisodium phosphate solution. What do you do? Choose all that apply.",
      correct: [
        "Wear protective gloves and eye protection",
        "Follow the product's label",
        "Use it on its own, mixed with no other cleaner",
      ],
      wrong: ["Add some bleach to make it stronger", "Wipe the grips with paint thinner afterwards"],
      explanation:
        "Trisodium phosphate can burn skin and badly damage eyes, so wear gloves and eye protection and follow the label. Never mix cleaners, and keep solvents off grips.",
    },
    {
      kind: "single",
      prompt: "A splash of trisodium phosphate solution gets in your eye. What do you do first?",
      correct: "Rinse the eye with plenty of water for several minutes, then tell a coach",
      wrong: ["Rub it dry with a towel", "Carry on and rinse it at the end", "Put some cleaner on a cloth and wipe it"],
      explanation:
        "The safety card for trisodium phosphate says to rinse the eyes with plenty of water for several minutes. Then get help from a coach.",
    },
    {
      kind: "single",
      prompt: "Can you mix bleach with another cleaner to get the grips clean faster?",
      correct: "No: never mix cleaners; use one product and follow its label",
      wrong: ["Yes, if the door is open", "Yes, bleach works better with a little ammonia", "Yes, if you wear gloves"],
      explanation:
        "Cleaning guidance is clear: never mix bleach with ammonia or any other cleaner. Use one product at a time and follow its label.",
    },
    {
      kind: "single",
      prompt: "Why not use solvents or paint thinners on handle grips?",
      correct: "They can damage rubber and foam grips",
      wrong: ["They make grips too sticky", "They are fine on any grip", "They are only a problem on sweep oars"],
      explanation:
        "Solvents and thinners can break down rubber and foam grips (and are flammable), so stick to a mild alkaline cleaner, a brass brush and water.",
    },
  ],
  "order:rig-change-steps": [
    {
      kind: "order",
      prompt: "Put the steps of changing your oar's settings in the right order.",
      steps: [
        "Measure the overall length from the blade tip to the handle end",
        "Move the handle to set the overall length",
        "Measure the inboard from the handle end to the collar",
        "Move the collar the right number of clicks and tighten its screws",
        "Measure both again and check them against the club's limits",
      ],
      explanation:
        "Length comes first, because moving the handle changes the inboard. Then set the inboard with the collar, and finish by measuring both again and checking the limits.",
    },
    {
      kind: "order",
      prompt: "You are moving your sculls to a boat with a different span. Put the steps in order.",
      steps: [
        "Look up the new boat's span and the settings your coach wants",
        "Set the overall length at the handle",
        "Set the inboard with the collar",
        "Check each collar sits in a click with tight screws",
        "Check everything again before going afloat",
      ],
      explanation:
        "Know the target first, then length before inboard (the handle move changes the inboard), then make sure the collars are seated and tight, and check it all again before launching.",
    },
  ],
  "order:cleaning-steps": [
    {
      kind: "order",
      prompt: "Put the steps of cleaning your handle grips in order.",
      steps: [
        "Put on gloves and eye protection",
        "Wet the grip with the cleaning solution",
        "Scrub with a soft brass brush or a pot scourer",
        "Rinse with clean water",
        "Check it feels sticky when wet, then leave it to dry",
      ],
      explanation:
        "Protect yourself first, then wet, scrub and rinse. A clean grip feels sticky when wet; let it dry before the next outing.",
    },
    {
      kind: "order",
      prompt: "Put these grip-cleaning steps in order.",
      steps: [
        "Read the cleaner's label",
        "Put on gloves and eye protection",
        "Scrub the grip with the solution and a soft brass brush",
        "Rinse the grip well with clean water",
        "Leave the handle to dry before it is used again",
      ],
      explanation:
        "Read the label before you open the cleaner, protect your hands and eyes, scrub, rinse off every trace of cleaner, and let the handle dry.",
    },
  ],
};

/** How many variants a bank has. */
export function bankVariantCount(name: FixedBankName): number {
  return fixedBanks[name].length;
}

/**
 * A written question from a bank: the variant at `variantIndex` (taken modulo the bank's size), or one
 * chosen by the seed when omitted; choices shuffled by the seed.
 */
export function bankQuestion(name: FixedBankName, rng: Rng, variantIndex?: number): Question {
  const variants = fixedBanks[name];
  const variant = variantIndex === undefined ? pick(rng, variants) : (variants[variantIndex % variants.length] as BankVariant);
  const base = { id: name, generator: name, prompt: variant.prompt, explanation: variant.explanation };
  switch (variant.kind) {
    case "single":
      return { ...base, kind: "single", ...singleChoice(rng, variant.correct, variant.wrong) };
    case "multiple":
      return { ...base, kind: "multiple", ...multipleChoice(rng, variant.correct, variant.wrong) };
    case "order":
      return { ...base, kind: "order", ...orderChoices(rng, variant.steps) };
  }
}
