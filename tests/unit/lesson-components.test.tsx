import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { Caution, CoachCheck, Tip } from "@/components/lessons/callout";
import { ClicksCalculator } from "@/components/lessons/clicks-calculator";
import { describeClicks, evaluateClicksInput, formatCm, formatSignedCm, parseCmInput } from "@/components/lessons/lesson-format";
import { OarDiagram } from "@/components/lessons/oar-diagram";
import { OverlapVisualiser } from "@/components/lessons/overlap-visualiser";
import { inboardClicks } from "@/lib/rigging/adjust";
import { mdxComponents, useMDXComponents } from "@/mdx-components";

/** Text content of every <text> element in the markup, in order. */
function svgTexts(html: string): string[] {
  return [...html.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((match) => match[1] ?? "");
}

describe("OarDiagram", () => {
  it("labels every part and names itself for screen readers", () => {
    const html = renderToStaticMarkup(<OarDiagram kind="scull" />);
    expect(html).toContain('role="img"');
    expect(html).toMatch(/<title id="[^"]+">Parts and measurements of a scull<\/title>/);
    expect(html).toMatch(/<desc id="[^"]+">[^<]*blade-side face of the collar/);
    expect(svgTexts(html)).toEqual(
      expect.arrayContaining(["handle", "shaft", "blade tip", "sleeve", "blade", "handle end", "collar (button)"]),
    );
  });

  it("points aria-labelledby at its own title and description", () => {
    const html = renderToStaticMarkup(<OarDiagram kind="sweep" />);
    const labelledBy = html.match(/aria-labelledby="([^"]+)"/)?.[1]?.split(" ") ?? [];
    expect(labelledBy).toHaveLength(2);
    for (const id of labelledBy) expect(html).toContain(`id="${id}"`);
  });

  it("marks the three dimensions with values from the typical settings", () => {
    const scull = svgTexts(renderToStaticMarkup(<OarDiagram kind="scull" />));
    expect(scull).toEqual(expect.arrayContaining(["overall length 288 cm", "inboard 88 cm", "outboard 200 cm"]));
    const sweep = svgTexts(renderToStaticMarkup(<OarDiagram kind="sweep" />));
    expect(sweep).toEqual(expect.arrayContaining(["overall length 374 cm", "inboard 116 cm", "outboard 258 cm"]));
    const custom = svgTexts(renderToStaticMarkup(<OarDiagram kind="scull" lengthCm={287.5} inboardCm={87.5} />));
    expect(custom).toEqual(expect.arrayContaining(["overall length 287.5 cm", "outboard 200 cm"]));
  });

  it("highlights by weight and words as well as colour", () => {
    const html = renderToStaticMarkup(<OarDiagram kind="scull" highlight="inboard" />);
    expect(html).toMatch(/font-weight="700"[^>]*>inboard 88 cm</);
    expect(html).toMatch(/font-weight="500"[^>]*>outboard 200 cm</);
    expect(html).toContain("The inboard is highlighted");
    expect(renderToStaticMarkup(<OarDiagram kind="scull" />)).not.toContain('font-weight="700"');
  });

  it("scales with its container and refuses an inboard longer than the oar", () => {
    expect(renderToStaticMarkup(<OarDiagram kind="scull" />)).toMatch(/viewBox="0 0 360 240"[^>]*class="[^"]*w-full/);
    expect(() => renderToStaticMarkup(<OarDiagram kind="scull" lengthCm={80} inboardCm={88} />)).toThrow(/inboard/);
  });
});

describe("callouts", () => {
  it("are notes with a heading word, not only a colour", () => {
    const cases = [
      [<Caution key="c">Keep clear.</Caution>, "Caution"],
      [<Tip key="t">Try this.</Tip>, "Tip"],
      [<CoachCheck key="k">Show the coach.</CoachCheck>, "Coach check"],
    ] as const;
    for (const [element, word] of cases) {
      const html = renderToStaticMarkup(element);
      expect(html).toContain('role="note"');
      const labelId = html.match(/aria-labelledby="([^"]+)"/)?.[1];
      expect(html).toMatch(new RegExp(`id="${labelId}"[^>]*>.*${word}</p>`));
      expect(html).toContain('aria-hidden="true"');
    }
    expect(renderToStaticMarkup(<Caution title="Chemicals">Gloves on.</Caution>)).toContain("Chemicals</p>");
  });
});

describe("ClicksCalculator before hydration", () => {
  const html = renderToStaticMarkup(<ClicksCalculator />);

  it("has a label for every input and a polite live result", () => {
    for (const label of ["Measured inboard (cm)", "Target inboard (cm)", "One click (cm)"]) {
      const forId = html.match(new RegExp(`<label for="([^"]+)"[^>]*>${label.replace(/[()]/g, "\\$&")}</label>`))?.[1];
      expect(forId, label).toBeTruthy();
      expect(html).toContain(`id="${forId}"`);
    }
    expect(html).toMatch(/role="status" aria-live="polite"/);
  });

  it("reads usefully without JavaScript: worked example and result in words, inputs inert", () => {
    expect(html).toContain("Worked example: you measure 87 cm and the target is 88 cm.");
    expect(html).toContain("Move the collar 2 clicks towards the blade.");
    expect(html).toContain("That makes the inboard 1 cm longer.");
    expect(html.match(/<input[^>]*disabled=""/g)).toHaveLength(3);
    expect(html).toContain("<noscript>");
  });

  it("explains a target between clicks", () => {
    const between = renderToStaticMarkup(<ClicksCalculator defaultCurrentCm={88.5} defaultTargetCm={87.2} />);
    expect(between).toContain("1.3 ÷ 0.5 = 2.6, nearest whole number 3");
    expect(between).toContain("Move the collar 3 clicks towards the handle.");
    expect(between).toContain("end up 0.2 cm shorter than the target");
  });
});

describe("the calculator's rules in words", () => {
  it("reads typed centimetres, decimal commas included", () => {
    expect(parseCmInput("87,5")).toBe(87.5);
    expect(parseCmInput(" 88 ")).toBe(88);
    expect(parseCmInput("")).toBeNull();
    expect(parseCmInput("eighty")).toBeNull();
    expect(parseCmInput("-3")).toBeNull();
    // The unit the field asks for may be typed after the number; no other unit is guessed at.
    expect(parseCmInput("287 cm")).toBe(287);
    expect(parseCmInput("287cm")).toBe(287);
    expect(parseCmInput("87,5 CM")).toBe(87.5);
    expect(parseCmInput("2870 mm")).toBeNull();
    expect(parseCmInput("cm")).toBeNull();
    expect(formatCm(0.25)).toBe("0.25");
    expect(formatSignedCm(-4)).toBe("−4");
  });

  it("gives a clear message for each bad field", () => {
    const outcome = evaluateClicksInput("abc", "300", "0");
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.errors.current).toMatch(/number of centimetres/);
    expect(outcome.errors.target).toMatch(/300 cm is unlikely/);
    expect(outcome.errors.click).toMatch(/size of one click/);
  });

  it("describes no change, shortening and lengthening", () => {
    expect(describeClicks(inboardClicks(88, 88), 0.5)).toEqual(["No clicks: the inboard is already on the target."]);
    expect(describeClicks(inboardClicks(89, 88), 0.5)[0]).toBe("Move the collar 2 clicks towards the handle.");
    const ok = evaluateClicksInput("87", "87.5", "0.5");
    expect(ok.ok && describeClicks(ok.result, ok.clickCm)[0]).toBe("Move the collar 1 click towards the blade.");
    expect(describeClicks(inboardClicks(88, 88.2), 0.5)[0]).toMatch(/less than half a click/);
  });
});

describe("OverlapVisualiser before hydration", () => {
  const html = renderToStaticMarkup(<OverlapVisualiser />);

  it("states the convention and both figures for span 159 cm, inboard 88 cm (FISA 2006 protocol)", () => {
    expect(html).toContain("measurement protocol: 2 × (inboard + half swivel width) − span, half swivel 2 cm");
    expect(html).toContain("Overlap: 21 cm");
    expect(html).toContain("2 × 88 − 159 = 17 cm");
    expect(svgTexts(html)).toEqual(expect.arrayContaining(["overlap 21 cm", "span 159 cm", "centre line"]));
  });

  it("draws an accessible picture and labelled controls", () => {
    expect(html).toContain('role="img"');
    expect(html).toContain("Two sculls crossing over the boat&#x27;s centre line</title>");
    expect(html).toMatch(/<label for="[^"]+"[^>]*>Span \(cm\)<\/label>/);
    expect(html).toMatch(/aria-label="Inboard slider"/);
    expect(html).toMatch(/aria-live="polite"/);
  });

  it("shows a gap when the handles do not meet", () => {
    const gap = renderToStaticMarkup(<OverlapVisualiser defaultSpanCm={172} defaultInboardCm={82} />);
    expect(gap).toContain("gap 4 cm");
    expect(gap).toContain("miss each other by 4 cm");
  });
});

describe("mdx-components", () => {
  it("maps the lesson components and styled elements, and the hook returns the same map", () => {
    for (const name of ["OarDiagram", "Caution", "Tip", "CoachCheck", "ClicksCalculator", "OverlapVisualiser", "h2", "table"]) {
      expect(mdxComponents).toHaveProperty(name);
    }
    expect(useMDXComponents().OarDiagram).toBe(OarDiagram);
    expect(renderToStaticMarkup(mdxComponents.table({ children: null }))).toContain("overflow-x-auto");
  });
});
