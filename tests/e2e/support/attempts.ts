import path from "node:path";
import sqlite3 from "sqlite3";
import { expect, type Page } from "@playwright/test";

interface StoredQuestion {
  id: string;
  kind: "numeric" | "single" | "multiple" | "order";
  answer: number | string | string[];
  choices?: { id: string; label: string }[];
}

/**
 * The test's oracle: reads an attempt's stored questions (with answers) straight from the e2e server's
 * SQLite file. No endpoint of the app ever returns answers before submission.
 */
export function storedQuestions(attemptId: string): Promise<StoredQuestion[]> {
  return readRow<{ questions: string }>("SELECT questions FROM quiz_attempts WHERE id = ?", [attemptId], `attempt ${attemptId}`).then(
    (row) => JSON.parse(row.questions) as StoredQuestion[],
  );
}

/** An athlete's first passing submission of a module's quiz, read from the e2e server's SQLite file. */
export function firstPassOf(email: string, slug: string): Promise<{ score: number; submittedAt: Date }> {
  return readRow<{ score: number; submitted_at: string }>(
    `SELECT a.score, a.submitted_at FROM quiz_attempts a JOIN users u ON u.id = a.user_id
     WHERE u.email = ? AND a.module_slug = ? AND a.passed = 1 ORDER BY a.submitted_at LIMIT 1`,
    [email, slug],
    `a passed ${slug} quiz of ${email}`,
  ).then((row) => ({ score: row.score, submittedAt: new Date(row.submitted_at) }));
}

function readRow<Row>(sql: string, values: unknown[], what: string): Promise<Row> {
  const file = path.join(process.cwd(), ".e2e-data", "slipway.sqlite");
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY, (openError) => {
      if (openError) return reject(openError);
      db.get<Row>(sql, values, (error, row) => {
        db.close();
        if (error) return reject(error);
        if (!row) return reject(new Error(`${what} not found`));
        resolve(row);
      });
    });
  });
}

async function arrange(page: Page, questionId: string, targetOrder: string[], labels: Map<string, string>): Promise<void> {
  const item = page.getByTestId(`question-${questionId}`);
  for (let position = 0; position < targetOrder.length; position += 1) {
    const label = labels.get(targetOrder[position]!)!;
    // Move the wanted step up until it reaches this position.
    for (let guard = 0; guard < targetOrder.length; guard += 1) {
      const texts = await item.locator("ol > li > span.flex-1").allTextContents();
      const current = texts.indexOf(label);
      if (current <= position) break;
      await item.getByRole("button", { name: `Move "${label}" up` }).click();
    }
  }
}

/** Answers every question in the open quiz form, rightly or wrongly. */
export async function answerQuiz(page: Page, questions: StoredQuestion[], correctly: boolean): Promise<void> {
  for (const question of questions) {
    const item = page.getByTestId(`question-${question.id}`);
    const choices = question.choices ?? [];
    if (question.kind === "numeric") {
      const value = correctly ? String(question.answer) : String(Number(question.answer) + 1000);
      await item.getByRole("textbox").fill(value);
    } else if (question.kind === "single") {
      const pick = correctly ? String(question.answer) : choices.find((choice) => choice.id !== question.answer)!.id;
      await item.locator(`input[value="${pick}"]`).check();
    } else if (question.kind === "multiple") {
      const right = question.answer as string[];
      const picks = correctly ? right : right.length === choices.length ? [choices[0]!.id] : choices.map((choice) => choice.id);
      for (const id of picks) await item.locator(`input[value="${id}"]`).check();
    } else {
      const right = question.answer as string[];
      const labels = new Map(choices.map((choice) => [choice.id, choice.label]));
      await arrange(page, question.id, correctly ? right : [...right].reverse(), labels);
    }
  }
}

/** Waits for the quiz form to open an attempt and returns its id and public payload. */
export async function openQuiz(page: Page, slug: string): Promise<{ attemptId: string; payload: string }> {
  const opened = page.waitForResponse(
    (response) => response.url().endsWith(`/api/modules/${slug}/attempts`) && response.request().method() === "POST",
  );
  await page.goto(`/learn/${slug}/quiz`);
  const response = await opened;
  const payload = await response.text();
  const { attemptId } = JSON.parse(payload) as { attemptId: string };
  await expect(page.getByTestId("quiz-form")).toBeVisible();
  return { attemptId, payload };
}
