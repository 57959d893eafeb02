import { axeFindings } from "./support/axe";
import { expect, test, type Page } from "@playwright/test";
import { demo, signIn } from "./support/auth";
import { answerQuiz, firstPassOf, openQuiz, storedQuestions } from "./support/attempts";
import { formatLongDate, isoDateOf } from "@/lib/clearance/dates";
import { machineTimeZone } from "@/lib/care/calendar";
import { loadAthleteEmail } from "@/lib/seed/load-athletes";

/** Every request that would open or resume a quiz attempt, from now on. */
function attemptRequests(page: Page): string[] {
  const seen: string[] = [];
  page.on("request", (request) => {
    if (request.method() === "POST" && /\/api\/modules\/[^/]+\/attempts$/.test(request.url())) seen.push(new URL(request.url()).pathname);
  });
  return seen;
}

/**
 * The quiz page refreshes its props once an attempt is opened or graded (the router keeps them for the
 * back button); waits for that refresh, so the test does not leave before it lands.
 */
function quizPageRefreshed(page: Page, slug: string) {
  return page.waitForResponse(
    (response) => new URL(response.url()).pathname === `/learn/${slug}/quiz` && response.request().headers()["rsc"] === "1",
  );
}

test("an athlete reads a lesson, fails the quiz, retakes it, passes, and the course page says so", async ({ page }) => {
  await signIn(page, demo.athlete);
  await expect(page.getByTestId("module-setting-inboard")).toContainText("Not started");

  await page.goto("/learn/setting-inboard");
  await expect(page.getByRole("heading", { level: 1 })).toContainText("inboard", { ignoreCase: true });
  await expect(page.locator("svg[role=img]").first()).toBeVisible();

  const opened = page.waitForResponse((response) => response.url().endsWith("/api/modules/setting-inboard/attempts"));
  await page.getByRole("button", { name: "I've read it: start the quiz" }).click();
  await expect(page).toHaveURL(/\/learn\/setting-inboard\/quiz$/);
  const first = await opened;
  const payload = await first.text();
  expect(first.status()).toBe(201);
  // The questions sent to the browser carry no answers or worked solutions.
  expect(payload).not.toMatch(/"answer"|"explanation"|"tolerance"|"generator"/);
  const { attemptId } = JSON.parse(payload) as { attemptId: string };

  const questions = await storedQuestions(attemptId);
  expect(questions.length).toBeGreaterThanOrEqual(6);
  await answerQuiz(page, questions, false);
  // A reload mid-quiz resumes the same attempt with the answers kept.
  const resumed = page.waitForResponse((response) => response.url().endsWith("/api/modules/setting-inboard/attempts"));
  await page.reload();
  const again = await resumed;
  expect(again.status()).toBe(201);
  expect((await again.json()) as { attemptId: string; resumed: boolean }).toMatchObject({ attemptId, resumed: true });
  await expect(page.getByText(`${questions.length} of ${questions.length} answered`)).toBeVisible();

  await page.getByRole("button", { name: "Hand in my answers" }).click();
  await expect(page.getByTestId("quiz-outcome")).toContainText("Not passed yet: 0%");
  await expect(page.getByText("Expected:").first()).toBeVisible();

  const retake = page.waitForResponse((response) => response.url().endsWith("/api/modules/setting-inboard/attempts"));
  await page.getByRole("button", { name: "Try a fresh set of questions" }).click();
  const second = (await (await retake).json()) as { attemptId: string };
  expect(second.attemptId).not.toBe(attemptId);
  await answerQuiz(page, await storedQuestions(second.attemptId), true);
  const refreshed = quizPageRefreshed(page, "setting-inboard");
  await page.getByRole("button", { name: "Hand in my answers" }).click();
  await expect(page.getByTestId("quiz-outcome")).toContainText("Passed: 100%");
  // The result says "ask a coach to watch you"; the way to ask is one tap away.
  await expect(page.getByRole("link", { name: "Ask a coach for the practical" })).toHaveAttribute(
    "href",
    "/learn/setting-inboard/practical",
  );
  await refreshed;

  const attemptsOpened = attemptRequests(page);
  await page.getByRole("link", { name: "Back to your course" }).click();
  const card = page.getByTestId("module-setting-inboard");
  await expect(card).toContainText("Quiz passed");
  await expect(card).toContainText("best score 100%");
  await expect(card).toContainText("2 attempts");

  // Back to the quiz page, and in again from the course page: it says the quiz is passed and starts nothing.
  await page.goBack();
  await expect(page).toHaveURL(/\/learn\/setting-inboard\/quiz$/);
  await expect(page.getByTestId("quiz-passed-summary")).toContainText(`with 100%`);
  await expect(page.getByRole("link", { name: "Ask a coach for the practical" })).toHaveAttribute(
    "href",
    "/learn/setting-inboard/practical",
  );
  await page.goForward();
  await card.getByRole("link", { name: "Practise the quiz" }).click();
  await expect(page.getByTestId("quiz-passed-summary")).toContainText(`with 100%`);
  await expect(page.getByTestId("quiz-form")).toHaveCount(0);
  expect(attemptsOpened).toEqual([]);

  const progress = (await (await page.request.get("/api/me/progress")).json()) as {
    modules: { slug: string; passed: boolean; attempts: number; lessonRead: boolean }[];
  };
  expect(progress.modules.find((entry) => entry.slug === "setting-inboard")).toMatchObject({ passed: true, attempts: 2, lessonRead: true });
});

test("a submitted attempt cannot be submitted again, and another athlete's attempt is not found", async ({ page, browser }) => {
  await signIn(page, demo.secondAthlete);
  const { attemptId } = await openQuiz(page, "overall-length");
  const submit = () => page.request.post(`/api/attempts/${attemptId}/submit`, { data: { answers: { q1: "1" } } });
  const firstSubmit = await submit();
  expect(firstSubmit.status()).toBe(200);
  const stored = (await firstSubmit.json()) as { score: number };
  const replay = await submit();
  expect(replay.status()).toBe(409);
  expect(((await replay.json()) as { result: { score: number } }).result.score).toBe(stored.score);

  const other = await browser.newContext();
  const otherPage = await other.newPage();
  await signIn(otherPage, demo.athlete);
  const foreign = await otherPage.request.post(`/api/attempts/${attemptId}/submit`, { data: { answers: {} } });
  expect(foreign.status()).toBe(404);
  await other.close();
});

test("an order question counts as answered once a step is moved, through a reload; an unmoved order can still be handed in", async ({
  page,
}) => {
  await signIn(page, demo.secondAthlete);
  const { attemptId } = await openQuiz(page, "grip-cleaning");
  const questions = await storedQuestions(attemptId);
  const total = questions.length;
  expect(questions.filter((question) => question.kind === "order")).toHaveLength(1);
  const count = page.getByText(/^\d+ of \d+ answered$/);
  // Its shuffled starting order is not an answer yet.
  await expect(count).toHaveText(`0 of ${total} answered`);
  await answerQuiz(
    page,
    questions.filter((question) => question.kind !== "order"),
    false,
  );
  await expect(count).toHaveText(`${total - 1} of ${total} answered`);
  await page.reload();
  await expect(page.getByTestId("quiz-form")).toBeVisible();
  await expect(count).toHaveText(`${total - 1} of ${total} answered`);

  // Handed in unmoved, the shown order is the answer that is marked.
  const order = questions.find((question) => question.kind === "order")!;
  await page.getByRole("button", { name: "Hand in my answers" }).click();
  await expect(page.getByTestId("quiz-outcome")).toContainText("Not passed yet: 0%");
  const shown = order.choices!.map((choice) => choice.label).join(" → ");
  await expect(page.getByText(`Not right: you answered ${shown}`)).toBeVisible();

  const retake = page.waitForResponse((response) => response.url().endsWith("/api/modules/grip-cleaning/attempts"));
  await page.getByRole("button", { name: "Try a fresh set of questions" }).click();
  const fresh = (await (await retake).json()) as { attemptId: string; questions: { id: string; kind: string }[] };
  const freshOrder = fresh.questions.find((question) => question.kind === "order")!;
  await expect(count).toHaveText(`0 of ${fresh.questions.length} answered`);
  const steps = page.getByTestId(`question-${freshOrder.id}`).locator("ol > li > span.flex-1");
  const firstStep = (await steps.first().textContent())!;
  const stepCount = await steps.count();
  const announcement = page.getByTestId(`question-${freshOrder.id}`).getByTestId("order-announcement");
  // By keyboard: focus stays with the step as it moves, and a screen reader hears its new place.
  await page.getByRole("button", { name: `Move "${firstStep}" down` }).focus();
  await page.keyboard.press("Enter");
  await expect(steps.nth(1)).toHaveText(firstStep);
  await expect(page.getByRole("button", { name: `Move "${firstStep}" down` })).toBeFocused();
  await expect(announcement).toHaveText(`"${firstStep}" is now step 2 of ${stepCount}.`);
  await expect(count).toHaveText(`1 of ${fresh.questions.length} answered`);
  // Moved back to where it started, it is still a deliberate answer, and stays one after a reload. At
  // the top its up button is disabled, so focus goes to its down button rather than being lost.
  await page.getByRole("button", { name: `Move "${firstStep}" up` }).click();
  await expect(steps.first()).toHaveText(firstStep);
  await expect(page.getByRole("button", { name: `Move "${firstStep}" down` })).toBeFocused();
  await expect(announcement).toHaveText(`"${firstStep}" is now step 1 of ${stepCount}.`);
  await expect(count).toHaveText(`1 of ${fresh.questions.length} answered`);
  await page.reload();
  await expect(page.getByTestId("quiz-form")).toBeVisible();
  await expect(count).toHaveText(`1 of ${fresh.questions.length} answered`);
});

/** Seeded by lib/seed/demo-certification.ts; no other spec changes her quizzes or sign-offs. */
const elin = "elin@lantern-reach.example";

test("a passed quiz opens on the pass and the way on; only the practise button starts an attempt, which then resumes directly", async ({
  page,
}) => {
  await signIn(page, elin);
  const opened = attemptRequests(page);

  // Signed off by a coach 41 days ago: on to the certificates.
  const pass = await firstPassOf(elin, "overall-length");
  // The demo club sets no time zone: its day is the server's, on this machine.
  const passedOn = formatLongDate(isoDateOf(pass.submittedAt, machineTimeZone()));
  await page.goto("/learn/overall-length/quiz");
  await expect(page.getByTestId("quiz-passed-summary")).toContainText(`Passed on ${passedOn} with ${Math.round(pass.score * 100)}%.`);
  await expect(page.getByRole("link", { name: "See your certificates" })).toHaveAttribute("href", "/learn/certificates");
  // Asked a coach two days ago: on to the practical page.
  await page.goto("/learn/changing-boats/quiz");
  await expect(page.getByRole("link", { name: "See your sign-off request" })).toHaveAttribute("href", "/learn/changing-boats/practical");
  await expect(page.getByTestId("quiz-form")).toHaveCount(0);
  // The working instructions belong to the questions, not to the pass.
  const workingLead = page.getByText("Work each answer out with the numbers given.");
  await expect(workingLead).toHaveCount(0);
  expect(opened).toEqual([]);

  const practice = page.waitForResponse((response) => response.url().endsWith("/api/modules/changing-boats/attempts"));
  const refreshed = quizPageRefreshed(page, "changing-boats");
  await page.getByRole("button", { name: "Practise with a fresh set of questions" }).click();
  const opening = (await (await practice).json()) as { attemptId: string; resumed: boolean };
  expect(opening.resumed).toBe(false);
  await expect(page.getByTestId("quiz-form")).toBeVisible();
  // The button is gone: focus moves to the form's first line rather than being lost.
  await expect(page.locator("#quiz-progress")).toBeFocused();
  await refreshed;
  await expect(workingLead).toBeVisible();
  expect(opened).toEqual(["/api/modules/changing-boats/attempts"]);

  // The open practice attempt resumes straight away: after going to the lesson and back, and on a reload.
  const questions = await storedQuestions(opening.attemptId);
  const first = questions.find((question) => question.kind === "numeric")!;
  await page.getByTestId(`question-${first.id}`).getByRole("textbox").fill("12");
  await page.getByRole("link", { name: "Back to the lesson" }).click();
  await expect(page).toHaveURL(/\/learn\/changing-boats$/);
  const resumedOnBack = page.waitForResponse((response) => response.url().endsWith("/api/modules/changing-boats/attempts"));
  await page.goBack();
  expect(await (await resumedOnBack).json()).toMatchObject({ attemptId: opening.attemptId, resumed: true });
  await expect(page.getByText("Picking up where you left off.")).toBeVisible();
  await expect(page.getByTestId(`question-${first.id}`).getByRole("textbox")).toHaveValue("12");
  await expect(page.getByTestId("quiz-passed")).toHaveCount(0);
  const resumedOnReload = page.waitForResponse((response) => response.url().endsWith("/api/modules/changing-boats/attempts"));
  await page.reload();
  expect(await (await resumedOnReload).json()).toMatchObject({ attemptId: opening.attemptId, resumed: true });
  await expect(page.getByTestId("quiz-form")).toBeVisible();
  await expect(page.getByTestId("quiz-passed")).toHaveCount(0);
});

test("a lesson finished without a connection says so beside the lesson, and the button works once back online", async ({
  page,
  context,
}) => {
  await signIn(page, loadAthleteEmail(33));
  await page.goto("/learn/grip-cleaning");
  const finished = page.getByRole("button", { name: "I've read it: start the quiz" });
  await expect(finished).toBeVisible();
  await context.setOffline(true);
  await finished.click();
  await expect(page.getByTestId("finish-lesson-offline")).toContainText("You are offline, so the quiz cannot start yet.");
  await expect(page).toHaveURL(/\/learn\/grip-cleaning$/);
  await expect(page.getByRole("heading", { level: 1 })).not.toHaveText("No connection");
  expect(await axeFindings(page)).toEqual([]);
  await context.setOffline(false);
  await expect(page.getByTestId("finish-lesson-offline")).toHaveCount(0);
  await finished.click();
  await expect(page).toHaveURL(/\/learn\/grip-cleaning\/quiz$/);
  await expect(page.getByTestId("quiz-form")).toBeVisible();
});

test("a lesson finished while the server gives no answer shows the error page, and Try again brings the lesson back", async ({ page }) => {
  await signIn(page, loadAthleteEmail(33));
  await page.goto("/learn/grip-cleaning");
  const finished = page.getByRole("button", { name: "I've read it: start the quiz" });
  await expect(finished).toBeVisible();
  await page.route("**/learn/grip-cleaning", (route) =>
    route.request().method() === "POST" ? route.abort("connectionreset") : route.continue(),
  );
  await finished.click();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Something went wrong");
  await expect(page.getByRole("main").getByRole("alert")).toContainText("the last change you made may not have been");
  await page.unroute("**/learn/grip-cleaning");
  await page.getByRole("button", { name: "Try again" }).click();
  await expect(page.getByRole("button", { name: "I've read it: start the quiz" })).toBeVisible();
  await expect(page).toHaveURL(/\/learn\/grip-cleaning$/);
});

test("without JavaScript the lesson's button still records the read and goes on to the quiz", async ({ page, browser }) => {
  await signIn(page, loadAthleteEmail(33));
  const context = await browser.newContext({ javaScriptEnabled: false, storageState: await page.context().storageState() });
  try {
    const plain = await context.newPage();
    await plain.goto("/learn/setting-inboard");
    await plain.getByRole("button", { name: "I've read it: start the quiz" }).click();
    await expect(plain).toHaveURL(/\/learn\/setting-inboard\/quiz$/);
  } finally {
    await context.close();
  }
});
