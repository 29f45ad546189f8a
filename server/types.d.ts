import type { Actor } from "./services/context";

declare global {
  namespace Express {
    interface Request {
      /** Set by the session middleware when a valid session cookie came with the request. */
      auth?: Actor;
    }
  }
}
export {};
