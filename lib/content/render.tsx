import type { ReactElement } from "react";
import { compileMDX } from "next-mdx-remote/rsc";
import { mdxComponents } from "@/mdx-components";

/**
 * Compiles a lesson's MDX body (frontmatter already removed by the loader) into a React element.
 * JS expressions are allowed because numeric props such as `defaultSpanCm={159}` need them; the
 * lessons are our own files and the dangerous-JS guard stays on.
 */
export async function renderLesson(source: string): Promise<ReactElement> {
  const { content } = await compileMDX({
    source,
    components: mdxComponents,
    options: { parseFrontmatter: false, blockJS: false, blockDangerousJS: true },
  });
  return content;
}
