/** The four roles of a group member, as the API spells them. */
export const roles = ["lead", "author", "reviewer", "reader"] as const;
export type Role = (typeof roles)[number];

/** How each role is named in the interface (see the glossary). */
export const roleLabels: Record<Role, string> = {
  lead: "group lead",
  author: "author",
  reviewer: "reviewer",
  reader: "reader",
};

export const roleDescriptions: Record<Role, string> = {
  lead: "manages members and publishes editions",
  author: "writes and edits notebooks",
  reviewer: "reads and leaves remarks",
  reader: "reads",
};

/** Roles that may start a notebook in a group. */
export function canWriteNotebooks(role: Role | null | undefined): boolean {
  return role === "lead" || role === "author";
}

export function roleLabel(role: string | null | undefined): string {
  return role && role in roleLabels ? roleLabels[role as Role] : "no role";
}

/** The article before a role in "You are … in the group": each group has one lead. */
export function roleArticle(role: string | null | undefined): "the" | "an" | "a" {
  if (role === "lead") return "the";
  return /^[aeiou]/i.test(roleLabel(role)) ? "an" : "a";
}
