import fs from "node:fs";
import path from "node:path";
import matter from "gray-matter";
import { describeIssues, kebabCaseSchema, moduleFrontmatterSchema, type ModuleMeta } from "@/lib/content/module-schema";

/** A lesson that failed validation; the message names the file and, where there is one, the field. */
export class LessonContentError extends Error {
  constructor(
    readonly fileName: string,
    readonly field: string | null,
    detail: string,
  ) {
    super(`content/modules/${fileName}: ${detail}`);
    this.name = "LessonContentError";
  }
}

/** A lesson: validated frontmatter plus its MDX body (frontmatter already removed). */
export interface LessonModule {
  meta: ModuleMeta;
  source: string;
}

const MDX_EXTENSION = ".mdx";

/** Parses one lesson file: frontmatter validated against the schema, slug must equal the file name. */
export function parseModuleFile(fileName: string, raw: string): LessonModule {
  let data: Record<string, unknown>;
  let body: string;
  try {
    // Passing options (even empty) stops gray-matter returning a shared cached object.
    const parsed = matter(raw, {});
    data = parsed.data;
    body = parsed.content;
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new LessonContentError(fileName, null, `frontmatter is not valid YAML (${reason})`);
  }
  if (Object.keys(data).length === 0) {
    throw new LessonContentError(fileName, null, "has no frontmatter block (--- … ---) at the top");
  }

  const result = moduleFrontmatterSchema.safeParse(data);
  if (!result.success) {
    const first = result.error.issues[0];
    const field = first && first.path.length > 0 ? first.path.map(String).join(".") : null;
    throw new LessonContentError(fileName, field, `invalid frontmatter: ${describeIssues(result.error)}`);
  }
  const meta = result.data;

  const expectedSlug = fileName.endsWith(MDX_EXTENSION) ? fileName.slice(0, -MDX_EXTENSION.length) : fileName;
  if (meta.slug !== expectedSlug) {
    throw new LessonContentError(fileName, "slug", `invalid frontmatter: slug: "${meta.slug}" must equal the file name "${expectedSlug}"`);
  }
  if (body.trim().length === 0) {
    throw new LessonContentError(fileName, null, "the lesson body is empty");
  }
  // The lesson page renders the title as the page's only h1, so lessons start at h2.
  if (/^#\s/m.test(body)) {
    throw new LessonContentError(fileName, null, "uses a level-1 heading (#); lessons start at ## because the page supplies the h1");
  }
  return { meta, source: body };
}

/** Checks rules that span lessons: unique slugs and orders, prerequisites exist and come earlier. Returns them sorted by order. */
export function checkModuleSet(modules: readonly LessonModule[]): LessonModule[] {
  const bySlug = new Map<string, LessonModule>();
  const byOrder = new Map<number, string>();
  for (const lesson of modules) {
    const { slug, order } = lesson.meta;
    const fileName = `${slug}${MDX_EXTENSION}`;
    if (bySlug.has(slug)) {
      throw new LessonContentError(fileName, "slug", `invalid frontmatter: slug: "${slug}" is used twice`);
    }
    const orderOwner = byOrder.get(order);
    if (orderOwner !== undefined) {
      throw new LessonContentError(
        fileName,
        "order",
        `invalid frontmatter: order: ${order} is already used by ${orderOwner}${MDX_EXTENSION}`,
      );
    }
    bySlug.set(slug, lesson);
    byOrder.set(order, slug);
  }
  for (const lesson of modules) {
    const { slug, order, prerequisites } = lesson.meta;
    const fileName = `${slug}${MDX_EXTENSION}`;
    for (const prerequisite of prerequisites) {
      const required = bySlug.get(prerequisite);
      if (!required) {
        throw new LessonContentError(
          fileName,
          "prerequisites",
          `invalid frontmatter: prerequisites: no lesson has the slug "${prerequisite}"`,
        );
      }
      if (required.meta.order >= order) {
        throw new LessonContentError(
          fileName,
          "prerequisites",
          `invalid frontmatter: prerequisites: "${prerequisite}" must come earlier in the course (lower order)`,
        );
      }
    }
  }
  return [...modules].sort((a, b) => a.meta.order - b.meta.order);
}

interface ModuleCatalogue {
  list: ModuleMeta[];
  bySlug: Map<string, LessonModule>;
}

let catalogue: ModuleCatalogue | null = null;

function readCatalogue(): ModuleCatalogue {
  // Fixed path segments so the bundler traces only content/modules.
  const fileNames = fs
    .readdirSync(path.join(process.cwd(), "content", "modules"))
    .filter((name) => name.endsWith(MDX_EXTENSION))
    .sort();
  const lessons = fileNames.map((fileName) =>
    parseModuleFile(fileName, fs.readFileSync(path.join(process.cwd(), "content", "modules", fileName), "utf8")),
  );
  const sorted = checkModuleSet(lessons);
  return {
    list: sorted.map((lesson) => lesson.meta),
    bySlug: new Map(sorted.map((lesson) => [lesson.meta.slug, lesson])),
  };
}

function getCatalogue(): ModuleCatalogue {
  // Re-read on every call in development so lesson edits show without a restart.
  if (process.env.NODE_ENV === "development") return readCatalogue();
  catalogue ??= readCatalogue();
  return catalogue;
}

/** All modules' frontmatter, sorted by course order. Throws LessonContentError on a bad lesson. */
export function listModules(): ModuleMeta[] {
  return getCatalogue().list;
}

/** One lesson by slug (frontmatter and MDX body), or null when no lesson has that slug. */
export function getModule(slug: string): LessonModule | null {
  if (!kebabCaseSchema.safeParse(slug).success) return null;
  return getCatalogue().bySlug.get(slug) ?? null;
}
