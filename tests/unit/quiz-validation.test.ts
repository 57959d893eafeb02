import { describe, expect, it } from "vitest";

import { maxAnswersPerSubmission, quizSubmissionSchema } from "@/lib/validations/quiz";

describe("quizSubmissionSchema", () => {
  it("accepts numbers, text and lists of ids", () => {
    const result = quizSubmissionSchema.safeParse({ answers: { q1: 4, q2: "3,5", q3: "b", q4: ["a", "c"] } });
    expect(result.success).toBe(true);
  });

  it("accepts an empty set of answers", () => {
    expect(quizSubmissionSchema.safeParse({ answers: {} }).success).toBe(true);
  });

  it.each([
    ["a non-finite number", { answers: { q1: Number.POSITIVE_INFINITY } }, ["answers", "q1"]],
    ["NaN", { answers: { q1: Number.NaN } }, ["answers", "q1"]],
    ["a long text", { answers: { q1: "x".repeat(201) } }, ["answers", "q1"]],
    ["a long id in a list", { answers: { q1: ["x".repeat(51)] } }, ["answers", "q1", 0]],
    ["a long list", { answers: { q1: Array.from({ length: 21 }, () => "a") } }, ["answers", "q1"]],
    ["an object value", { answers: { q1: { a: 1 } } }, ["answers", "q1"]],
    ["a boolean value", { answers: { q1: true } }, ["answers", "q1"]],
  ])("refuses %s, naming the answer", (_label, input, path) => {
    const result = quizSubmissionSchema.safeParse(input);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(path);
  });

  it("refuses a long key", () => {
    const result = quizSubmissionSchema.safeParse({ answers: { ["q".repeat(21)]: 1 } });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path[0]).toBe("answers");
  });

  it("refuses too many answers", () => {
    const answers = Object.fromEntries(Array.from({ length: maxAnswersPerSubmission + 1 }, (_, i) => [`q${i + 1}`, 1]));
    const result = quizSubmissionSchema.safeParse({ answers });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(["answers"]);
  });

  it("refuses unknown top-level keys and a missing answers field", () => {
    expect(quizSubmissionSchema.safeParse({ answers: {}, score: 1 }).success).toBe(false);
    const missing = quizSubmissionSchema.safeParse({});
    expect(missing.success).toBe(false);
    expect(missing.error?.issues[0]?.path).toEqual(["answers"]);
  });
});
