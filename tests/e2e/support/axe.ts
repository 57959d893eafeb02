import AxeBuilder from "@axe-core/playwright";
import type { Page } from "@playwright/test";

/** The WCAG 2.2 AA rule tags every scan in the suite uses (issue 6). */
export const wcagTags = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"];

/**
 * axe's findings on the page as it is now, one "rule: targets" line each, so a failing expectation says
 * which element broke which rule. `include` narrows the scan (an open dialog: "dialog[open]").
 */
export async function axeFindings(page: Page, include?: string): Promise<string[]> {
  const builder = new AxeBuilder({ page }).withTags(wcagTags);
  const results = await (include ? builder.include(include) : builder).analyze();
  return results.violations.map((violation) => `${violation.id}: ${violation.nodes.map((node) => node.target.join(" ")).join(", ")}`);
}
