import { afterEach, describe, expect, it, vi } from "vitest";
import { redirect } from "next/navigation";
import { UnrecognizedActionError } from "next/dist/client/components/unrecognized-action-error";
import { outdatedPageMessage, reachAction, unreachedMessage } from "@/lib/http/reach-action";

describe("reachAction", () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.restoreAllMocks();
  });

  it("passes an action's own result through, failures included", async () => {
    expect(await reachAction(async () => ({ ok: true as const, message: "Saved." }))).toEqual({ ok: true, message: "Saved." });
    const refusal = { ok: false as const, message: "Pick a day.", fieldErrors: { raceDay: ["Pick a day."] } };
    expect(await reachAction(async () => refusal)).toBe(refusal);
  });

  it("turns an action that got no answer into a failure the form can show", async () => {
    vi.spyOn(console, "warn").mockImplementation(() => {});
    const outcome = await reachAction(() => Promise.reject(new TypeError("Failed to fetch")));
    expect(outcome).toEqual({ ok: false, message: unreachedMessage(true), fieldErrors: {} });
    // Online, the request may have arrived: the message must not promise that nothing was saved.
    expect(outcome.message).toContain("may not have been saved");
  });

  it("says so when the device is offline, since then nothing left it", async () => {
    vi.spyOn(console, "warn").mockImplementation(() => {});
    vi.stubGlobal("navigator", { onLine: false });
    const outcome = await reachAction(() => Promise.reject(new TypeError("Failed to fetch")));
    expect(outcome.message).toBe(unreachedMessage(false));
    expect(outcome.message).toContain("offline, so nothing was saved");
  });

  it("tells a page older than the last update to reload, since the server no longer has its action", async () => {
    vi.spyOn(console, "warn").mockImplementation(() => {});
    const outcome = await reachAction(() =>
      Promise.reject(new UnrecognizedActionError('Server Action "7f00" was not found on the server.')),
    );
    expect(outcome).toEqual({ ok: false, message: outdatedPageMessage, fieldErrors: {} });
    expect(outcome.message).toContain("Reload the page");
  });

  it("lets an action's redirect through to Next's router instead of calling it a failure", async () => {
    await expect(
      reachAction(async () => {
        redirect("/learn");
      }),
    ).rejects.toMatchObject({ digest: expect.stringContaining("NEXT_REDIRECT") });
  });
});
