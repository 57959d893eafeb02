import { inboardClicks, type InboardClicks } from "@/lib/rigging/adjust";

/**
 * Reads a centimetre value typed by a person; accepts a decimal comma ("87,5") and the unit typed after it
 * ("287 cm", "287cm"). Null if not a number, and for any other unit ("2870 mm"): no guessing at units.
 */
export function parseCmInput(text: string): number | null {
  const normalised = text
    .trim()
    .replace(/\s*cm$/i, "")
    .replace(",", ".");
  if (!/^(\d+(\.\d*)?|\.\d+)$/.test(normalised)) return null;
  const value = Number(normalised);
  return Number.isFinite(value) ? value : null;
}

/** Centimetres for display: at most two decimals, no trailing zeros ("88", "87.5", "0.25"). */
export function formatCm(value: number): string {
  return String(Number(value.toFixed(2)));
}

function clicksWord(count: number): string {
  return count === 1 ? "1 click" : `${count} clicks`;
}

/** The collar instruction in words, e.g. ["Move the collar 2 clicks towards the blade.", …]. */
export function describeClicks(result: InboardClicks, clickCm: number): string[] {
  const lines: string[] = [];
  if (result.direction === "none") {
    lines.push(
      result.changeCm === 0
        ? "No clicks: the inboard is already on the target."
        : `No clicks: the difference (${formatCm(Math.abs(result.changeCm))} cm) is less than half a click, so leave the collar where it is.`,
    );
  } else {
    const longer = result.direction === "towards-blade";
    lines.push(
      `Move the collar ${clicksWord(result.clicks)} towards the ${longer ? "blade" : "handle"}.`,
      `That makes the inboard ${formatCm(result.clicks * clickCm)} cm ${longer ? "longer" : "shorter"}.`,
    );
  }
  if (result.residualCm !== 0) {
    // residualCm = target − reached: positive means the reached inboard is still short of the target.
    lines.push(
      `Whole clicks cannot reach the target exactly: the inboard will end up ${formatCm(Math.abs(result.residualCm))} cm ${
        result.residualCm > 0 ? "shorter" : "longer"
      } than the target. Ask your coach if that matters.`,
    );
  }
  return lines;
}

// Outside these ranges the number is almost certainly a typo or a misread tape, not a real oar.
const INBOARD_MIN_CM = 50;
const INBOARD_MAX_CM = 150;
const CLICK_MIN_CM = 0.1;
const CLICK_MAX_CM = 2;

export type ClicksField = "current" | "target" | "click";
export type ClicksOutcome =
  { ok: true; result: InboardClicks; clickCm: number } | { ok: false; errors: Partial<Record<ClicksField, string>> };

function readInboard(text: string, what: string): { value: number } | { error: string } {
  const value = parseCmInput(text);
  if (value === null) return { error: `Enter the ${what} as a number of centimetres, for example 88 or 87.5.` };
  if (value < INBOARD_MIN_CM || value > INBOARD_MAX_CM) {
    return {
      error: `An inboard of ${formatCm(value)} cm is unlikely: inboards are between ${INBOARD_MIN_CM} and ${INBOARD_MAX_CM} cm. Measure again.`,
    };
  }
  return { value };
}

/** Checks the calculator's three typed values and, when all are sensible, computes the clicks. */
export function evaluateClicksInput(currentText: string, targetText: string, clickText: string): ClicksOutcome {
  const current = readInboard(currentText, "inboard you measured");
  const target = readInboard(targetText, "target inboard");
  const clickCm = parseCmInput(clickText);
  const clickOk = clickCm !== null && clickCm >= CLICK_MIN_CM && clickCm <= CLICK_MAX_CM;
  if ("value" in current && "value" in target && clickOk) {
    return { ok: true, result: inboardClicks(current.value, target.value, clickCm), clickCm };
  }
  const errors: Partial<Record<ClicksField, string>> = {};
  if ("error" in current) errors.current = current.error;
  if ("error" in target) errors.target = target.error;
  if (!clickOk) {
    errors.click = `Enter the size of one click in centimetres, between ${CLICK_MIN_CM} and ${CLICK_MAX_CM} (most collars: 0.5).`;
  }
  return { ok: false, errors };
}

/** Like formatCm, but negative values use a true minus sign ("−4"), which screen readers say as "minus". */
export function formatSignedCm(value: number): string {
  const text = formatCm(Math.abs(value));
  return value < 0 && text !== "0" ? `−${text}` : text;
}
