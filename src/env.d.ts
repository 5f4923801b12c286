/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    user: import('@server/auth/session.ts').SessionUser | null;
    session: import('@server/auth/session.ts').SessionInfo | null;
  }
}
