import "server-only";
import { notFound } from "next/navigation";
import { NotFoundError } from "@/lib/http/errors";

/** For pages: a NotFoundError from data access becomes Next's 404 page instead of the error page. */
export async function orNotFound<T>(work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}
