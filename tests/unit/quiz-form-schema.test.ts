import { describe, expect, it } from "vitest";
import { quizFormSchema } from "@/app/(learn)/learn/[slug]/quiz/_components/quiz-schema";
import { parseNumericAnswer } from "@/lib/quiz/grade";
import type { PublicQuestion } from "@/lib/quiz/types";

const numeric: PublicQuestion = { id: "q1", kind: "numeric", prompt: "How many centimetres must you slide the handle?", unit: "cm" };

function problemFor(text: string): string | undefined {
  const result = quizFormSchema([numeric]).safeParse({ answers: { q1: text } });
  return result.success ? undefined : result.error.issues[0]?.message;
}

describe("the quiz form's check of a numeric answer", () => {
  it.each(["+1.5", ".5", "3,", "1,5", "−2", " 4 ", "0"])("lets %j through, as the server grades it as a number", (text) => {
    expect(parseNumericAnswer(text)).not.toBeNull();
    expect(problemFor(text)).toBeUndefined();
  });

  it.each(["3 cm", "1e3", "two", "1.2.3", "--1"])("refuses %j with an example, as the server would mark it wrong", (text) => {
    expect(parseNumericAnswer(text)).toBeNull();
    expect(problemFor(text)).toBe("Enter a number, for example 3 or 2.5.");
  });

  it("asks for a number when the box is empty", () => {
    expect(problemFor("   ")).toBe("Enter a number.");
  });
});
