import type { AuthCache } from "../cache/auth-cache";
import type { EstimateMemo } from "../cache/estimate-memo";
import type { LibraryCache } from "../cache/library-cache";
import type { Db } from "../db/client";
import type { SessionStore } from "../db/repositories/sessions";
import type { Env } from "../env";
import type { Logger } from "../logger";
import type { OutboxSender } from "../mail/outbox-sender";
import type { ObjectStore } from "../storage/object-store";
import type { Role } from "../../shared/permissions";

/** What every use case may reach. Built once in createApp; tests build their own. */
export interface ServiceContext {
  db: Db;
  env: Env;
  logger: Logger;
  sessions: SessionStore;
  outbox: OutboxSender;
  /** Logger files, parsed series and attachments (S3-compatible). */
  objects: ObjectStore;
  clock: () => Date;
  /** Short-lived memory of who each session is (server/cache/auth-cache.ts). */
  authCache: AuthCache;
  /** Library versions the live preview reads, cleared by every library write (server/cache/library-cache.ts). */
  libraryCache: LibraryCache;
  /** The live preview's answers until the library changes (server/cache/estimate-memo.ts). */
  estimateMemo: EstimateMemo;
}

/** The signed-in caller, from the session middleware. */
export interface Actor {
  userId: string;
  organizationId: string;
  role: Role;
  sessionId: string;
}
