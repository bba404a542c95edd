import "server-only";
import { appBaseUrl } from "../secret";

/** Characters BibTeX fields cannot hold as they are. */
function bibEscape(text: string): string {
  return text.replace(/\\/g, "\\textbackslash{}").replace(/([{}&%$#_])/g, "\\$1");
}

/**
 * A BibTeX entry citing one edition: @misc with the group as a corporate author (in braces
 * so BibTeX does not split it into names), the permanent link and the SHA-256 in the note.
 *
 * @example
 * bibtexForEdition({ key: "vierbein-3f2a-e2", … }) // "@misc{vierbein-3f2a-e2,\n  title = {…}, …"
 */
export function bibtexForEdition({
  key,
  title,
  groupName,
  number,
  publishedAt,
  url,
  sha256,
}: {
  key: string;
  title: string;
  groupName: string;
  number: number;
  publishedAt: Date;
  url: string;
  sha256: string;
}): string {
  const month = ["jan", "feb", "mar", "apr", "may", "jun", "jul", "aug", "sep", "oct", "nov", "dec"][publishedAt.getUTCMonth()];
  return [
    `@misc{${key},`,
    `  title = {{${bibEscape(title)}}},`,
    `  author = {{${bibEscape(groupName)}}},`,
    `  year = {${publishedAt.getUTCFullYear()}},`,
    `  month = ${month},`,
    `  howpublished = {Vierbein notebook, edition ${number}},`,
    `  url = {${url}},`,
    `  note = {SHA-256: ${sha256}},`,
    "}",
  ].join("\n");
}

/** The citation key: the notebook id's first block and the edition number. */
export function citationKey(notebookId: string, number: number): string {
  return `vierbein-${notebookId.slice(0, 8)}-e${number}`;
}

/** The permanent link of an edition. */
export function editionPath(notebookId: string, number: number): string {
  return `/editions/${notebookId}/${number}`;
}

/**
 * The site's own origin for links written into citations and mails: the configured one,
 * never the request's Host header (a client could name any host and have it cited or mailed).
 */
export function siteOrigin(): string {
  return appBaseUrl();
}
