import type { ReactElement } from "react";
import { compileMDX } from "next-mdx-remote/rsc";
import { mdxComponents } from "@/mdx-components";

const compiled = new Map<string, Promise<ReactElement>>();

/**
 * Compiles a lesson's MDX body (frontmatter already removed by the loader) into a React element, once
 * per process and source text: lessons change only with a deploy, and compiling on every request
 * delayed the lesson's largest paint in the benchmark. JS expressions are allowed because numeric props
 * such as `defaultSpanCm={159}` need them; the lessons are our own files and the dangerous-JS guard stays on.
 */
export function renderLesson(source: string): Promise<ReactElement> {
  let element = compiled.get(source);
  if (!element) {
    element = compileMDX({
      source,
      components: mdxComponents,
      options: { parseFrontmatter: false, blockJS: false, blockDangerousJS: true },
    }).then(({ content }) => content);
    element.catch(() => compiled.delete(source));
    compiled.set(source, element);
  }
  return element;
}
