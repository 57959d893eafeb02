import { describe, expect, it } from "vitest";
import { outboxMessageId, sentAtOfOutboxId } from "@/lib/mail/outbox-names";

describe("outbox message names", () => {
  it("keeps the moment a message was written in its file-safe name", () => {
    const id = outboxMessageId(new Date("2026-12-03T11:19:22.338Z"), "e55feb4f");
    expect(id).toBe("2026-12-03T11-19-22-338Z-e55feb4f");
    expect(id).toMatch(/^[0-9A-Za-z-]{10,80}$/);
    expect(sentAtOfOutboxId(id)).toBe("2026-12-03T11:19:22.338Z");
  });

  it("gives no moment for a name that does not start with one", () => {
    expect(sentAtOfOutboxId("message-e55feb4f")).toBeNull();
    expect(sentAtOfOutboxId("2026-13-45T99-99-99-999Z-e55feb4f")).toBeNull();
  });
});
