import type { Logger } from "./logger";
import type { Actor } from "./services/context";

declare global {
  namespace Express {
    interface Request {
      /** Set by the session middleware when a valid session cookie came with the request. */
      auth?: Actor;
      /** Set by the request log: quoted in 500 answers and sent as X-Request-Id. */
      id?: string;
      /** The server logger, set by the request log. */
      log?: Logger;
    }
  }
}
export {};
