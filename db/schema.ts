// Server side: the one Drizzle schema shared by PGlite and PostgreSQL.
// Row types are inferred beside each table so queries and routes never restate them.
import { sql } from "drizzle-orm";
import {
  type AnyPgColumn,
  bigint,
  bigserial,
  boolean,
  customType,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from "drizzle-orm/pg-core";

/** Binary column (Yjs updates, snapshots). PGlite gives Uint8Array, node-postgres a Buffer; both leave as Uint8Array. */
export const bytea = customType<{ data: Uint8Array; driverData: Uint8Array }>({
  dataType: () => "bytea",
  toDriver: (value) => Buffer.from(value.buffer, value.byteOffset, value.byteLength),
  fromDriver: (value) => new Uint8Array(value),
});

const createdAt = () => timestamp("created_at", { withTimezone: true }).notNull().defaultNow();

export const roleEnum = pgEnum("member_role", ["lead", "author", "reviewer", "reader"]);

// ---------------------------------------------------------------- people

export const users = pgTable("users", {
  id: uuid("id").primaryKey().defaultRandom(),
  /** Always stored lower-cased and trimmed, so uniqueness is case-insensitive. */
  email: text("email").notNull().unique(),
  name: text("name").notNull().default(""),
  /** Null for accounts that only ever signed in by magic link. */
  passwordHash: text("password_hash"),
  emailVerified: timestamp("email_verified", { withTimezone: true }),
  createdAt: createdAt(),
});
export type User = typeof users.$inferSelect;
export type NewUser = typeof users.$inferInsert;

/**
 * One-time tokens. next-auth's magic links use identifier = e-mail; our own flows prefix
 * the identifier with their purpose ("verify-email:…", "reset-password:…"). Only a hash
 * of the token is ever stored.
 */
export const verificationTokens = pgTable(
  "verification_tokens",
  {
    identifier: text("identifier").notNull(),
    token: text("token").notNull(),
    expires: timestamp("expires", { withTimezone: true }).notNull(),
  },
  // Tokens are random, so the hash alone finds its row (links may arrive without the e-mail).
  (t) => [primaryKey({ columns: [t.identifier, t.token] }), uniqueIndex("verification_tokens_token_idx").on(t.token)],
);
export type VerificationToken = typeof verificationTokens.$inferSelect;

// ---------------------------------------------------------------- groups

export const groups = pgTable("groups", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  description: text("description").notNull().default(""),
  createdAt: createdAt(),
});
export type Group = typeof groups.$inferSelect;
export type NewGroup = typeof groups.$inferInsert;

export const memberships = pgTable(
  "memberships",
  {
    groupId: uuid("group_id")
      .notNull()
      .references(() => groups.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.groupId, t.userId] }), index("memberships_user_idx").on(t.userId)],
);
export type Membership = typeof memberships.$inferSelect;

export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    groupId: uuid("group_id")
      .notNull()
      .references(() => groups.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: roleEnum("role").notNull(),
    tokenHash: text("token_hash").notNull().unique(),
    invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    acceptedAt: timestamp("accepted_at", { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [index("invitations_group_idx").on(t.groupId)],
);
export type Invitation = typeof invitations.$inferSelect;

// ---------------------------------------------------------------- notebooks and document state

export const notebooks = pgTable(
  "notebooks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    groupId: uuid("group_id")
      .notNull()
      .references(() => groups.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    summary: text("summary").notNull().default(""),
    /** Tiptap JSON of the current document; null until someone writes in it. */
    content: jsonb("content").$type<Record<string, unknown>>(),
    /** Compacted Yjs state (Y.encodeStateAsUpdate); later updates live in notebook_updates. */
    ydoc: bytea("ydoc"),
    /** Highest notebook_updates.id already merged into ydoc. */
    ydocCompactedThrough: bigint("ydoc_compacted_through", { mode: "number" }).notNull().default(0),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("notebooks_group_idx").on(t.groupId)],
);
export type Notebook = typeof notebooks.$inferSelect;
export type NewNotebook = typeof notebooks.$inferInsert;

/** Append-only log of accepted Yjs updates; written before an update is acknowledged. */
export const notebookUpdates = pgTable(
  "notebook_updates",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    notebookId: uuid("notebook_id")
      .notNull()
      .references(() => notebooks.id, { onDelete: "cascade" }),
    data: bytea("data").notNull(),
    userId: uuid("user_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("notebook_updates_notebook_idx").on(t.notebookId, t.id)],
);
export type NotebookUpdate = typeof notebookUpdates.$inferSelect;

export const checkpointKindEnum = pgEnum("checkpoint_kind", ["manual", "auto", "before-restore"]);

export const checkpoints = pgTable(
  "checkpoints",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    notebookId: uuid("notebook_id")
      .notNull()
      .references(() => notebooks.id, { onDelete: "cascade" }),
    kind: checkpointKindEnum("kind").notNull(),
    label: text("label").notNull().default(""),
    content: jsonb("content").$type<Record<string, unknown>>(),
    ydoc: bytea("ydoc"),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("checkpoints_notebook_idx").on(t.notebookId, t.createdAt)],
);
export type Checkpoint = typeof checkpoints.$inferSelect;

/**
 * Published, frozen versions. Rows are immutable: a trigger (see the edition_immutable
 * migration) rejects UPDATE and DELETE, and the notebook reference is RESTRICT so a
 * notebook with editions cannot be deleted out from under its permanent links.
 */
export const editions = pgTable(
  "editions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    notebookId: uuid("notebook_id")
      .notNull()
      .references(() => notebooks.id, { onDelete: "restrict" }),
    number: integer("number").notNull(),
    title: text("title").notNull(),
    content: jsonb("content").$type<Record<string, unknown>>().notNull(),
    sha256: text("sha256").notNull(),
    /** Per step: its verdict at publication (the check ledger). */
    ledger: jsonb("ledger").$type<unknown[]>().notNull(),
    /** Why the lead published despite a refuted step; null when none was refuted. */
    reason: text("reason"),
    publishedBy: uuid("published_by").references(() => users.id, { onDelete: "set null" }),
    publishedAt: timestamp("published_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("editions_notebook_number_idx").on(t.notebookId, t.number)],
);
export type Edition = typeof editions.$inferSelect;

// ---------------------------------------------------------------- review

export const remarks = pgTable(
  "remarks",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    notebookId: uuid("notebook_id")
      .notNull()
      .references(() => notebooks.id, { onDelete: "cascade" }),
    /** Null for the first remark of a thread; replies point at it. */
    parentId: uuid("parent_id").references((): AnyPgColumn => remarks.id, { onDelete: "cascade" }),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    /** Where the thread is anchored: a step id and/or Yjs relative positions (base64). */
    anchor: jsonb("anchor").$type<Record<string, unknown>>(),
    body: text("body").notNull(),
    settled: boolean("settled").notNull().default(false),
    settledBy: uuid("settled_by").references(() => users.id, { onDelete: "set null" }),
    settledAt: timestamp("settled_at", { withTimezone: true }),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("remarks_notebook_idx").on(t.notebookId, t.createdAt)],
);
export type Remark = typeof remarks.$inferSelect;

export const attachments = pgTable(
  "attachments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    notebookId: uuid("notebook_id")
      .notNull()
      .references(() => notebooks.id, { onDelete: "cascade" }),
    fileName: text("file_name").notNull(),
    /** Content type decided by sniffing the bytes, never by the file name. */
    contentType: text("content_type").notNull(),
    size: integer("size").notNull(),
    sha256: text("sha256").notNull(),
    storageKey: text("storage_key").notNull().unique(),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("attachments_notebook_idx").on(t.notebookId)],
);
export type Attachment = typeof attachments.$inferSelect;

// ---------------------------------------------------------------- mail and audit

/** What the app sent (the mailroom reads this in development and demo mode). */
export const mailMessages = pgTable(
  "mail_messages",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    kind: text("kind").notNull(),
    from: text("from_address").notNull(),
    to: text("to_addresses").array().notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    createdAt: createdAt(),
  },
  (t) => [index("mail_messages_created_idx").on(t.createdAt)],
);
export type MailMessage = typeof mailMessages.$inferSelect;

export const auditOutcomeEnum = pgEnum("audit_outcome", ["allowed", "denied"]);

export const auditLog = pgTable(
  "audit_log",
  {
    id: bigserial("id", { mode: "number" }).primaryKey(),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    /** Null when nobody was signed in. Not a foreign key: the log outlives accounts. */
    actorId: uuid("actor_id"),
    action: text("action").notNull(),
    resourceType: text("resource_type").notNull(),
    resourceId: text("resource_id"),
    outcome: auditOutcomeEnum("outcome").notNull(),
    detail: jsonb("detail").$type<Record<string, unknown>>().notNull().default(sql`'{}'::jsonb`),
    ip: text("ip"),
  },
  (t) => [index("audit_log_at_idx").on(t.at), index("audit_log_actor_idx").on(t.actorId)],
);
export type AuditEntry = typeof auditLog.$inferSelect;
