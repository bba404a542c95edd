import "server-only";
import { createHash, randomUUID } from "node:crypto";
import type { Db } from "@/db/client";
import { createAttachment } from "@/db/queries/attachments";
import type { Attachment } from "@/db/schema";
import { AppError } from "../errors";
import { deleteObject, putObject } from "./object-store";
import { EXTENSION_BY_TYPE, sniffAttachmentType } from "./sniff";

/** Largest attachment, in bytes (10 MB). */
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;
/** Room for the multipart envelope around the file. */
const MAX_BODY_BYTES = MAX_ATTACHMENT_BYTES + 64 * 1024;

const tooLarge = () => new AppError("payload_too_large:attachment", "The file is larger than 10 MB. Nothing was stored.");

/** Reads the body up to the limit; stops reading (413) at the first byte beyond it. */
async function readCapped(request: Request): Promise<Uint8Array> {
  if (Number(request.headers.get("content-length") || 0) > MAX_BODY_BYTES) throw tooLarge();
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > MAX_BODY_BYTES) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** The uploaded file of a multipart/form-data body (field "file"), bounded in size before it is parsed. */
export async function readUploadedFile(request: Request): Promise<{ name: string; bytes: Uint8Array }> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\b/i.test(type)) {
    throw new AppError("unsupported_media_type:body", "Send the file as multipart/form-data in a field named “file”.");
  }
  const body = await readCapped(request);
  let form: FormData;
  try {
    form = await new Response(Buffer.from(body), { headers: { "content-type": type } }).formData();
  } catch (error) {
    throw new AppError("bad_request:body", "The upload could not be read as a form.", { cause: error });
  }
  const file = form.get("file");
  if (!file || typeof file === "string") throw new AppError("bad_request:file", "Choose a file to upload (form field “file”).");
  if (file.size > MAX_ATTACHMENT_BYTES) throw tooLarge();
  if (file.size === 0) throw new AppError("bad_request:file", "The file is empty.");
  return { name: file.name || "upload", bytes: new Uint8Array(await file.arrayBuffer()) };
}

/** A file name safe to show and to put in a download header: no paths, no control characters. */
export function cleanFileName(name: string, extension: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  const cleaned = base.replace(/[\u0000-\u001f\u007f"]/g, "").trim().slice(0, 200) || "attachment";
  // The stored name carries the sniffed type's extension, whatever the upload was called.
  const stem = cleaned.replace(/\.[A-Za-z0-9]{1,8}$/, "");
  return `${stem}.${extension}`;
}

/**
 * Stores an upload: the type is decided by its bytes (415 otherwise), the object is written
 * to file storage, then the row; if the row cannot be written the object is removed again,
 * so a refusal or failure leaves nothing behind.
 */
export async function storeAttachment({ db, notebookId, uploadedBy, name, bytes }: { db: Db; notebookId: string; uploadedBy: string; name: string; bytes: Uint8Array }): Promise<Attachment> {
  if (bytes.byteLength > MAX_ATTACHMENT_BYTES) throw tooLarge();
  const contentType = sniffAttachmentType(bytes);
  if (!contentType) {
    throw new AppError("unsupported_media_type:attachment", "Only PNG, JPEG and PDF figures and CSV data can be attached; this file's content is none of these. Nothing was stored.");
  }
  const id = randomUUID();
  const storageKey = `notebooks/${notebookId}/${id}`;
  await putObject({ key: storageKey, body: bytes, contentType });
  try {
    return await createAttachment({
      db,
      attachment: {
        id,
        notebookId,
        fileName: cleanFileName(name, EXTENSION_BY_TYPE[contentType]),
        contentType,
        size: bytes.byteLength,
        sha256: createHash("sha256").update(bytes).digest("hex"),
        storageKey,
        uploadedBy,
      },
    });
  } catch (error) {
    await deleteObject({ key: storageKey }).catch(() => {});
    throw error;
  }
}
