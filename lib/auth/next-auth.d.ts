// What Ionleaf keeps in a session besides Auth.js's own fields (display hints and the
// session version checked on every request; lib/access/actor.ts reloads the member).
import "next-auth";

declare module "next-auth" {
  interface User {
    labId?: string;
    role?: string;
    sessionVersion?: number;
  }
}
