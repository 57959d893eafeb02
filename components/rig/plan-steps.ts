import { describeClicks, formatCm } from "@/components/lessons/lesson-format";
import type { HandleMechanism } from "@/lib/fleet/catalogue";
import type { RigPlanResponse } from "@/lib/fleet/plan-response";
import { inboardAfterLengthChangeCm } from "@/lib/rigging/adjust";
import { simpleOverlapCm } from "@/lib/rigging/geometry";
import { roundTo } from "@/lib/rigging/round";
import type { OarSettings, OarType } from "@/lib/rigging/types";

/** What the steps are worked out for, besides the plan's own numbers. */
export interface PlanContext {
  oarType: OarType;
  measured: OarSettings;
  target: OarSettings;
  clickCm: number;
  handleMechanism: HandleMechanism;
  spanCm?: number;
  spreadCm?: number;
  halfSwivelCm: number;
}

export type PlanStepKey = "handle" | "collar" | "result" | "check";

export interface PlanStep {
  key: PlanStepKey;
  heading: string;
  lines: string[];
}

/** Always shown after the steps (common practice): re-measure, tighten, check before going afloat. */
export const goingAfloatCautions = [
  "Measure the overall length and the inboard again after every change.",
  "Seat the collar in a click and tighten its screws: a collar that slips on the water makes the oar unrowable.",
  "Tighten the handle again (clamp screws, or check the end screw has not backed off).",
  "Check everything again before going afloat, and follow your coach and your club's rules.",
] as const;

function handleLines(plan: RigPlanResponse, context: PlanContext): string[] {
  const moveCm = formatCm(Math.abs(plan.length.changeCm));
  if (plan.length.action === "none") {
    return [`The overall length is already ${formatCm(context.target.lengthCm)} cm: leave the handle where it is.`];
  }
  const out = plan.length.action === "lengthen";
  const lines = [
    `${out ? "Lengthen" : "Shorten"} the oar by ${moveCm} cm: move the handle ${moveCm} cm ${out ? "out of" : "into"} the shaft.`,
    context.handleMechanism === "clamped-slide"
      ? `Loosen the handle's clamp screws, slide the handle ${moveCm} cm ${out ? "out" : "in"}, and tighten the screws again.`
      : `Turn the screw in the end of the handle until the handle has moved ${moveCm} cm ${out ? "out" : "in"}; if you are not sure which way to turn it, ask your coach.`,
    `Measure from the blade tip to the end of the handle: it should read ${formatCm(context.target.lengthCm)} cm.`,
  ];
  const startCm = inboardAfterLengthChangeCm(context.measured.inboardCm, plan.length.changeCm);
  lines.push(
    `The collar has not moved, so the inboard now reads ${formatCm(startCm)} cm (it was ${formatCm(context.measured.inboardCm)} cm).`,
  );
  return lines;
}

function collarLines(plan: RigPlanResponse, context: PlanContext): string[] {
  const lines = describeClicks(plan.inboard, context.clickCm);
  if (plan.inboard.direction !== "none") {
    lines.push(`Loosen the collar, move it, seat it in its click, and tighten its screws.`);
  }
  return lines;
}

function resultLines(plan: RigPlanResponse, context: PlanContext): string[] {
  const reachedInboardCm = roundTo(context.target.inboardCm - plan.inboard.residualCm, 2);
  const lines = [
    `Overall length ${formatCm(context.target.lengthCm)} cm, from the blade tip to the end of the handle.`,
    `Inboard ${formatCm(reachedInboardCm)} cm, from the end of the handle to the face of the collar that rests against the swivel.`,
    `Outboard ${formatCm(plan.outboardCm)} cm (overall length − inboard); lever ratio ${plan.leverRatio.toFixed(3)}.`,
  ];
  if (reachedInboardCm !== context.target.inboardCm) {
    lines.push(`The target inboard is ${formatCm(context.target.inboardCm)} cm; whole clicks get as close as they can.`);
  }
  return lines;
}

function checkLines(plan: RigPlanResponse, context: PlanContext): string[] {
  const half = formatCm(context.halfSwivelCm);
  if (context.oarType === "sculling" && context.spanCm !== undefined && plan.overlapCm !== undefined) {
    const simple = simpleOverlapCm("sculling", context.target.inboardCm, context.spanCm);
    return [
      `Overlap of the handles: ${formatCm(plan.overlapCm)} cm with this boat's span of ${formatCm(context.spanCm)} cm.`,
      `Shown by the measurement-protocol convention: 2 × (inboard + half swivel width) − span, with your club's half swivel width of ${half} cm. Without the swivel term (2 × inboard − span) it is ${formatCm(simple)} cm.`,
      ...(plan.spanGearing !== undefined ? [`Span gearing ${plan.spanGearing.toFixed(3)} (outboard ÷ half the span).`] : []),
    ];
  }
  if (context.oarType === "sweep" && context.spreadCm !== undefined && plan.overlapCm !== undefined) {
    const simple = simpleOverlapCm("sweep", context.target.inboardCm, context.spreadCm);
    return [
      `Spread check: the handle reaches ${formatCm(plan.overlapCm)} cm past the boat's centre line with this boat's spread of ${formatCm(context.spreadCm)} cm.`,
      `Shown by the measurement-protocol convention: inboard + half swivel width − spread, with your club's half swivel width of ${half} cm. Without the swivel term (inboard − spread) it is ${formatCm(simple)} cm.`,
      ...(plan.spanGearing !== undefined ? [`Span gearing ${plan.spanGearing.toFixed(3)} (outboard ÷ spread).`] : []),
    ];
  }
  return ["This boat has no span or spread on record, so the overlap cannot be checked here: ask your coach."];
}

/**
 * The boat change in the order it must be done: the handle first (it moves the handle end and so the
 * inboard), then the collar clicks from where the inboard now stands, what the oar should then measure,
 * and the overlap or spread check.
 */
export function planSteps(plan: RigPlanResponse, context: PlanContext): PlanStep[] {
  return [
    { key: "handle", heading: "Set the overall length (move the handle)", lines: handleLines(plan, context) },
    { key: "collar", heading: "Set the inboard (move the collar)", lines: collarLines(plan, context) },
    { key: "result", heading: "What the oar should now measure", lines: resultLines(plan, context) },
    {
      key: "check",
      heading: context.oarType === "sculling" ? "Check the overlap" : "Check against the spread",
      lines: checkLines(plan, context),
    },
  ];
}

/** A saved plan in one line for coaches, e.g. "Handle out 1 cm, then collar 2 clicks towards the blade." */
export function planSummary(plan: RigPlanResponse): string {
  const handle =
    plan.length.action === "none"
      ? "Handle left as it was"
      : `Handle ${plan.length.action === "lengthen" ? "out" : "in"} ${formatCm(Math.abs(plan.length.changeCm))} cm`;
  const clicks = plan.inboard.clicks === 1 ? "1 click" : `${plan.inboard.clicks} clicks`;
  const collar =
    plan.inboard.direction === "none"
      ? "collar left in its click"
      : `collar ${clicks} towards the ${plan.inboard.direction === "towards-blade" ? "blade" : "handle"}`;
  return `${handle}, then ${collar}.`;
}
