import "server-only";

/** The content types an attachment may have; anything else is refused (415). */
export const ATTACHMENT_TYPES = ["image/png", "image/jpeg", "application/pdf", "text/csv"] as const;
export type AttachmentType = (typeof ATTACHMENT_TYPES)[number];

/** Figures can be embedded in the document and exported; CSV is data only. */
export const FIGURE_TYPES: readonly AttachmentType[] = ["image/png", "image/jpeg", "application/pdf"];

export const EXTENSION_BY_TYPE: Record<AttachmentType, string> = {
  "image/png": "png",
  "image/jpeg": "jpg",
  "application/pdf": "pdf",
  "text/csv": "csv",
};

const startsWith = (bytes: Uint8Array, signature: readonly number[]) => signature.every((b, i) => bytes[i] === b);

const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const JPEG = [0xff, 0xd8, 0xff];
const PDF = [0x25, 0x50, 0x44, 0x46, 0x2d]; // "%PDF-"

/** Is this plain UTF-8 text without control characters (other than tab, CR, LF)? */
function isPlainText(bytes: Uint8Array): boolean {
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return false;
  }
  if (/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(text)) return false;
  // Scripts start with "#!"; a renamed script is not data, whatever it is called.
  return !text.startsWith("#!");
}

/**
 * Decides an upload's type from its first bytes, never from its name or the type the
 * browser claims: PNG, JPEG and PDF by their signatures, CSV as plain UTF-8 text. Null
 * for anything else (executables, archives, HTML with a .png name …).
 */
export function sniffAttachmentType(bytes: Uint8Array): AttachmentType | null {
  if (bytes.length === 0) return null;
  if (startsWith(bytes, PNG)) return "image/png";
  if (startsWith(bytes, JPEG)) return "image/jpeg";
  if (startsWith(bytes, PDF)) return "application/pdf";
  if (!isPlainText(bytes)) return null;
  // Markup is not data: a page or SVG named .csv would be served back to someone.
  const head = new TextDecoder().decode(bytes.subarray(0, 512)).trimStart().toLowerCase();
  if (head.startsWith("<")) return null;
  return "text/csv";
}
