// Knex row types, one interface per table (types/tables/*.d.ts), as rows come back
// from PostgreSQL with the type parsers of knexfile.ts: bigint and numeric as
// numbers, date as "YYYY-MM-DD" text, timestamptz as a Date, jsonb as parsed JSON
// (unknown: each reader says what it expects). Written from db/migrations; a
// migration that adds, drops or retypes a column changes its interface here.
// With these, db("table") rows and db("table").insert/update are typed; a join or
// an aliased table ("drives as d") still needs the caller to say what it selects.
// Columns with a CHECK list have that list's type.
// This file: People, groups and what the app keeps for them (mail, files, limits, idempotency keys).
import "knex/types/tables";
import type { Role } from "@/lib/auth/roles";
import type { Units } from "@/lib/format/look";
import type { NotificationKind } from "@/lib/notify/kinds";

declare module "knex/types/tables" {
  interface UsersRow {
    id: string;
    email: string;
    name: string;
    password_hash: string | null;
    created_at: Date;
    email_verified_at: Date | null;
    session_version: number;
  }
  interface GroupsRow {
    id: string;
    slug: string;
    name: string;
    town: string | null;
    workshop_lat: number | null;
    workshop_lng: number | null;
    created_at: Date;
    time_zone: string;
    /** 20261204030000_group_look: a BCP 47 tag from lib/format LOCALES. */
    locale: string;
    units: Units;
  }
  interface MembershipsRow {
    group_id: string;
    user_id: string;
    role: Role;
    created_at: Date;
    current_drive_id: string | null;
  }
  interface InvitationsRow {
    id: string;
    group_id: string;
    email: string;
    role: Role;
    token_hash: string;
    invited_by: string | null;
    created_at: Date;
    sent_at: Date;
    expires_at: Date;
    accepted_at: Date | null;
    accepted_by: string | null;
    revoked_at: Date | null;
  }
  /** A mailed link's row: password_resets and email_verifications have the same columns. */
  interface MailedLinkRow {
    id: string;
    user_id: string;
    token_hash: string;
    created_at: Date;
    expires_at: Date;
    used_at: Date | null;
  }
  interface RateLimitsRow {
    key: string;
    points: number;
    expire: number | null;
  }
  interface IdempotencyKeysRow {
    actor_id: string;
    key: string;
    method: string;
    path: string;
    body_hash: string;
    status: number | null;
    response: unknown | null;
    created_at: Date;
  }
  interface OutboxRow {
    id: number;
    group_id: string | null;
    to_address: string;
    subject: string;
    text_body: string;
    html_body: string | null;
    kind: string;
    status: string;
    attempts: number;
    last_error: string | null;
    created_at: Date;
    next_attempt_at: Date;
    sent_at: Date | null;
    /** 20261208010000: extra headers (List-Unsubscribe…), or null. */
    headers: Record<string, string> | null;
  }
  /** 20261208010000: a person's switch for one kind of notification (no row: sent). */
  interface NotificationOptoutsRow {
    user_id: string;
    kind: NotificationKind;
    via: "settings" | "oneClick" | "link";
    created_at: Date;
  }
  /** 20261208010000: one row per notification sent; (kind, key) is the claim. */
  interface NotificationSendsRow {
    kind: NotificationKind;
    key: string;
    group_id: string;
    user_id: string | null;
    outbox_id: number | null;
    created_at: Date;
  }
  interface FilesRow {
    id: string;
    group_id: string | null;
    uploaded_by: string | null;
    key: string;
    url: string;
    name: string;
    size: number;
    mime: string;
    purpose: string;
    subject_id: string | null;
    created_at: Date;
    /** Set while archived (migration 20261212010000). */
    archived_at: Date | null;
  }
  interface Tables {
    users: UsersRow;
    groups: GroupsRow;
    memberships: MembershipsRow;
    invitations: InvitationsRow;
    password_resets: MailedLinkRow;
    email_verifications: MailedLinkRow;
    rate_limits: RateLimitsRow;
    idempotency_keys: IdempotencyKeysRow;
    outbox: OutboxRow;
    files: FilesRow;
    notification_optouts: NotificationOptoutsRow;
    notification_sends: NotificationSendsRow;
  }
}
