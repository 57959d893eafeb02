import type { ComponentPropsWithoutRef } from "react";
import type { MDXComponents } from "mdx/types";
import { Caution, CoachCheck, Tip } from "@/components/lessons/callout";
import { ClicksCalculator } from "@/components/lessons/clicks-calculator";
import { OarDiagram } from "@/components/lessons/oar-diagram";
import { OverlapVisualiser } from "@/components/lessons/overlap-visualiser";

/**
 * The one components map for lessons. next-mdx-remote does not read this file by itself, so
 * lib/content/render.tsx passes this same map to compileMDX.
 */
export const mdxComponents = {
  h2: (props: ComponentPropsWithoutRef<"h2">) => (
    <h2 className="mt-10 mb-3 text-xl font-semibold tracking-tight text-slate-900" {...props} />
  ),
  h3: (props: ComponentPropsWithoutRef<"h3">) => <h3 className="mt-8 mb-2 text-lg font-semibold text-slate-900" {...props} />,
  p: (props: ComponentPropsWithoutRef<"p">) => <p className="my-4 text-base leading-7 text-slate-800" {...props} />,
  ul: (props: ComponentPropsWithoutRef<"ul">) => (
    <ul className="my-4 list-disc space-y-2 pl-6 text-base leading-7 text-slate-800" {...props} />
  ),
  ol: (props: ComponentPropsWithoutRef<"ol">) => (
    <ol className="my-4 list-decimal space-y-2 pl-6 text-base leading-7 text-slate-800" {...props} />
  ),
  li: (props: ComponentPropsWithoutRef<"li">) => <li className="pl-1" {...props} />,
  a: (props: ComponentPropsWithoutRef<"a">) => (
    <a className="font-medium text-river-700 underline decoration-2 underline-offset-2 hover:text-river-900" {...props} />
  ),
  strong: (props: ComponentPropsWithoutRef<"strong">) => <strong className="font-semibold text-slate-900" {...props} />,
  table: (props: ComponentPropsWithoutRef<"table">) => (
    // Wide tables scroll sideways on a phone instead of squashing the text.
    <div className="my-6 overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm text-slate-800" {...props} />
    </div>
  ),
  th: (props: ComponentPropsWithoutRef<"th">) => (
    <th className="border-b-2 border-slate-300 px-3 py-2 font-semibold text-slate-900" {...props} />
  ),
  td: (props: ComponentPropsWithoutRef<"td">) => <td className="border-b border-slate-200 px-3 py-2 align-top" {...props} />,
  OarDiagram,
  Caution,
  Tip,
  CoachCheck,
  ClicksCalculator,
  OverlapVisualiser,
} satisfies MDXComponents;

/** Next.js's hook for @next/mdx pages; returns the same map so every renderer agrees. */
export function useMDXComponents(components?: MDXComponents): MDXComponents {
  return { ...mdxComponents, ...components };
}
