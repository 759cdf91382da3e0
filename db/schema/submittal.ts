import { integer, sqliteTable, text, index, uniqueIndex } from "drizzle-orm/sqlite-core";
import { createdAt, id } from "./columns";
import { project } from "./project";
import { room } from "./room";
import { user } from "./auth";
import { attachment } from "./attachment";

// A lettered revision of one room's submittal. A draft holds only its letter (and the error of
// a render that failed); issuing stores the frozen snapshot (canonical JSON and its SHA-256) and
// the rendered PDF, after which nothing here changes but the decision and, once, supersession.
export const SUBMITTAL_STATES = ["draft", "issued", "approved", "approved-as-noted", "returned", "superseded"] as const;
export type SubmittalState = (typeof SUBMITTAL_STATES)[number];

export const submittal = sqliteTable(
  "submittal",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => project.id, { onDelete: "cascade" }),
    // An issued revision outlives its room: the room's name and the snapshot keep what it was.
    roomId: text("room_id").references(() => room.id, { onDelete: "set null" }),
    roomName: text("room_name").notNull(),
    letter: text("letter").notNull(),
    state: text("state", { enum: SUBMITTAL_STATES }).notNull().default("draft"),
    snapshot: text("snapshot"),
    snapshotSha256: text("snapshot_sha256"),
    issuedAt: integer("issued_at", { mode: "timestamp_ms" }),
    issuedBy: text("issued_by").references(() => user.id, { onDelete: "set null" }),
    // What the consultant confirmed at issue (rule breaks, open pins, fire flags), as JSON.
    confirmed: text("confirmed"),
    // Why the last attempt to issue this draft failed, shown until an issue succeeds.
    renderError: text("render_error"),
    // The client's decision, kept when a later revision supersedes this one.
    outcome: text("outcome", { enum: ["approved", "approved-as-noted", "returned"] }),
    decidedAt: integer("decided_at", { mode: "timestamp_ms" }),
    decidedBy: text("decided_by").references(() => user.id, { onDelete: "set null" }),
    // The full name the client typed as signature, their notes, and the SHA-256 of the PDF decided on.
    signature: text("signature"),
    notes: text("notes"),
    decidedPdfSha256: text("decided_pdf_sha256"),
    supersededAt: integer("superseded_at", { mode: "timestamp_ms" }),
    supersededBy: text("superseded_by"),
    createdBy: text("created_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("submittal_room_letter_uq").on(t.roomId, t.letter), index("submittal_project_idx").on(t.projectId)],
);

// The stored files of a revision: its PDF, the decision record, the shop pack (one per unit
// system, so the CSVs read in the installer's units). Content-hash names under the data folder.
export const SUBMITTAL_DOCUMENT_KINDS = ["submittal", "decision-record", "shop-pack"] as const;
export type SubmittalDocumentKind = (typeof SUBMITTAL_DOCUMENT_KINDS)[number];

export const submittalDocument = sqliteTable(
  "submittal_document",
  {
    id: id(),
    submittalId: text("submittal_id")
      .notNull()
      .references(() => submittal.id, { onDelete: "cascade" }),
    kind: text("kind", { enum: SUBMITTAL_DOCUMENT_KINDS }).notNull(),
    units: text("units", { enum: ["metric", "imperial"] }).notNull(),
    name: text("name").notNull(),
    mime: text("mime").notNull(),
    sha256: text("sha256").notNull(),
    size: integer("size").notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("submittal_document_uq").on(t.submittalId, t.kind, t.units)],
);

// A panel of an approved revision as built: when and by whom it was marked installed, and a
// site photo. `placementId` is the snapshot's placement id (the live board may have moved on).
export const installation = sqliteTable(
  "installation",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => project.id, { onDelete: "cascade" }),
    submittalId: text("submittal_id")
      .notNull()
      .references(() => submittal.id, { onDelete: "cascade" }),
    placementId: text("placement_id").notNull(),
    code: text("code").notNull(),
    installedAt: integer("installed_at", { mode: "timestamp_ms" }),
    installedBy: text("installed_by").references(() => user.id, { onDelete: "set null" }),
    photoId: text("photo_id").references(() => attachment.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("installation_placement_uq").on(t.submittalId, t.placementId), index("installation_project_idx").on(t.projectId)],
);

export type Submittal = typeof submittal.$inferSelect;
export type SubmittalDocument = typeof submittalDocument.$inferSelect;
export type Installation = typeof installation.$inferSelect;
