import "server-only";
import { fileTypeFromBuffer } from "file-type";
import { imageSize } from "image-size";
import { PayloadTooLargeError, UnsupportedMediaError, ValidationError } from "@/lib/http/errors";
import { checkPng, maxCheckedPngPixels } from "@/lib/images/complete-png";

/** Room for the multipart boundaries and part headers around the file itself. */
const multipartOverheadBytes = 16 * 1024;

function megabytes(bytes: number): string {
  return `${Math.round((bytes / (1024 * 1024)) * 10) / 10} MB`;
}

/**
 * Reads the body while counting bytes and stops (413) as soon as it passes the limit, so an oversized
 * upload is never held in memory whole. A declared Content-Length over the limit is refused before a
 * single byte is read.
 */
export async function readBodyWithin(request: Request, maxBytes: number, field = "body"): Promise<Uint8Array<ArrayBuffer>> {
  const tooLarge = new PayloadTooLargeError(`the upload is larger than ${megabytes(maxBytes)}.`, field);
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > maxBytes) throw tooLarge;
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let received = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    received += value.byteLength;
    if (received > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge;
    }
    chunks.push(value);
  }
  const body = new Uint8Array(received);
  let offset = 0;
  for (const chunk of chunks) {
    body.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return body;
}

/**
 * The bytes of one file sent as multipart/form-data under `field`, at most `maxBytes`. The file name
 * and type the browser sent are ignored: callers sniff the type from the bytes and choose the name.
 */
export async function readUploadedFile(
  request: Request,
  { maxBytes, field = "file" }: { maxBytes: number; field?: string },
): Promise<Uint8Array> {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    throw new UnsupportedMediaError(`send the file as multipart/form-data, in the part "${field}".`);
  }
  const body = await readBodyWithin(request, maxBytes + multipartOverheadBytes, field);
  let form: FormData;
  try {
    form = await new Response(body, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw new ValidationError(`${field}: the upload could not be read`, {
      [field]: ["the upload could not be read"],
    });
  }
  const file = form.get(field);
  if (!(file instanceof Blob) || file.size === 0) {
    throw new ValidationError(`${field}: choose a file`, { [field]: ["choose a file"] });
  }
  if (file.size > maxBytes) throw new PayloadTooLargeError(`the upload is larger than ${megabytes(maxBytes)}.`, field);
  return new Uint8Array(await file.arrayBuffer());
}

/** The image type read from the bytes themselves; 415 unless it is one of `allowed`. */
export async function sniffImageType<T extends string>(bytes: Uint8Array, allowed: readonly T[], what: string): Promise<T> {
  const detected = await fileTypeFromBuffer(bytes);
  const mime = detected?.mime as string | undefined;
  if (!mime || !(allowed as readonly string[]).includes(mime)) {
    throw new UnsupportedMediaError(`${what} must be ${describeTypes(allowed)}; this file is not.`, "file");
  }
  // The first bytes name the type; the image's own header (its size) must also read, so a PNG signature
  // followed by anything else is not stored as a photo. A PNG is also decoded whole (checkPng): a logo
  // cut short after its header would otherwise stall the PDFs it is drawn on.
  const damaged = new UnsupportedMediaError(
    `${what} looks like a ${typeNames[mime] ?? mime} but is damaged or cut short; export it again.`,
    "file",
  );
  const size = readableDimensions(bytes, mime);
  if (!size) throw damaged;
  if (mime === "image/png") {
    const check = checkPng(bytes, size.width, size.height);
    if (check === "too-many-pixels") {
      throw new UnsupportedMediaError(`${what} has more than ${maxCheckedPngPixels / 1_000_000} megapixels; export it smaller.`, "file");
    }
    if (check === "damaged") throw damaged;
  }
  return mime as T;
}

const sizeTypes: Record<string, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };

/** The image header's width and height, when they read and agree with the sniffed type (image-size). */
function readableDimensions(bytes: Uint8Array, mime: string): { width: number; height: number } | null {
  try {
    const { width = 0, height = 0, type } = imageSize(bytes);
    const agrees = sizeTypes[mime] === undefined || type === sizeTypes[mime];
    return width > 0 && height > 0 && agrees ? { width, height } : null;
  } catch {
    return null;
  }
}

const typeNames: Record<string, string> = { "image/jpeg": "JPEG", "image/png": "PNG", "image/webp": "WebP" };

function describeTypes(types: readonly string[]): string {
  const names = types.map((type) => typeNames[type] ?? type);
  return names.length > 1 ? `${names.slice(0, -1).join(", ")} or ${names.at(-1)}` : (names[0] ?? "");
}

export const fileExtensions: Record<string, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
};
