import { expect, test } from "@playwright/test";
import { demo, signedInContext } from "./support/auth";

/** Edges of the coach's and the administrator's pages: stale links, stale pages, stale messages. */
test.describe("coach and admin edges", () => {
  test("a record that does not exist shows the not-found page, not the error page", async ({ browser }) => {
    const { context: coachContext, page: coach } = await signedInContext(browser, demo.coach);
    for (const path of ["/roster/athletes/999999", "/roster/sign-offs/00000000-0000-4000-8000-000000000000"]) {
      await coach.goto(path);
      await expect(coach.getByRole("heading", { level: 1 }), path).toHaveText("Not found");
    }
    await coachContext.close();

    const { context: adminContext, page: admin } = await signedInContext(browser, demo.admin);
    await admin.goto("/club/register/00000000-0000-4000-8000-000000000000");
    await expect(admin.getByRole("heading", { level: 1 })).toHaveText("Not found");
    await adminContext.close();
  });
});
