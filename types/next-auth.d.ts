import "next-auth";
import "next-auth/jwt";

declare module "next-auth" {
  interface Session {
    userId: string;
    groupId: string | null;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    userId?: string;
    groupId?: string | null;
  }
}
