import type { Role } from "@/lib/auth/roles";

// The accounts endpoints' answers, as both sides see them: the server's
// queries declare they return these, and the client's hooks read them. Safe
// in the client (no server imports).

/** One member of the acting group (GET /api/members, PATCH /api/members/:userId). */
export interface Member {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

/** An invitation not yet accepted (GET /api/invitations, POST …/resend). */
export interface Invitation {
  id: string;
  email: string;
  role: Role;
  sentAt: string;
  expiresAt: string;
  expired: boolean;
}

/** One of the signed-in person's groups (GET /api/me/groups). */
export interface Membership {
  id: string;
  slug: string;
  name: string;
  role: Role;
}

export interface MyGroup extends Membership {
  active: boolean;
}
