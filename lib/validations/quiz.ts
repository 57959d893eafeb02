import { z } from "zod";

/** A quiz draws at most 10 questions; twice that leaves room without leaving the record unbounded. */
export const maxAnswersPerSubmission = 20;

/**
 * One submitted quiz: answers keyed by question id (q1, q2, …). Values are a number or numeric text
 * (numeric questions), a choice id (single) or a list of choice ids (multiple, order). Every part is
 * bounded. z.number() rejects Infinity and NaN in zod 4, so no `.finite()` (deprecated no-op) is needed.
 */
export const quizSubmissionSchema = z.strictObject({
  answers: z
    .record(z.string().max(20), z.union([z.number(), z.string().max(200), z.array(z.string().max(50)).max(20)]))
    .refine((answers) => Object.keys(answers).length <= maxAnswersPerSubmission, {
      error: `At most ${maxAnswersPerSubmission} answers can be sent at once`,
    }),
});

export type QuizSubmission = z.infer<typeof quizSubmissionSchema>;
