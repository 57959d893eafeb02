import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { Button } from "@/components/ui/button";

// renderToStaticMarkup renders as the server does, before hydration.
describe("Button before hydration", () => {
  it("is disabled in the server's HTML, so a tap before the script runs is never lost or sent as a GET", () => {
    expect(renderToStaticMarkup(<Button type="submit">Sign in</Button>)).toMatch(/<button[^>]* disabled=""/);
    expect(renderToStaticMarkup(<Button type="button">Remove</Button>)).toMatch(/<button[^>]* disabled=""/);
  });

  it("stays enabled when it works without the script (a plain GET filter form)", () => {
    expect(
      renderToStaticMarkup(
        <Button type="submit" worksWithoutScript>
          Show
        </Button>,
      ),
    ).not.toMatch(/ disabled=""/);
  });

  it("says what it is doing while pending", () => {
    const html = renderToStaticMarkup(
      <Button type="submit" pending pendingLabel="Saving…" worksWithoutScript>
        Save
      </Button>,
    );
    expect(html).toContain("Saving…");
    expect(html).toContain('aria-busy="true"');
    expect(html).toContain('disabled=""');
  });
});
