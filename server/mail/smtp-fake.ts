import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

/**
 * A local SMTP server that accepts every message and keeps it in memory. `npm start` and the
 * tests run it on 127.0.0.1 so mail goes through real SMTP without leaving the machine.
 */
export interface CaughtMessage {
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: Date;
}

export interface SmtpFake {
  port: number;
  messages: CaughtMessage[];
  /** Resolves with the first caught message that matches, waiting up to timeoutMs. */
  waitFor(match: (m: CaughtMessage) => boolean, timeoutMs?: number): Promise<CaughtMessage>;
  clear(): void;
  stop(): Promise<void>;
}

const MAX_KEPT = 500;

export async function startSmtpFake(port: number): Promise<SmtpFake> {
  const messages: CaughtMessage[] = [];
  const waiters = new Set<() => void>();

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.push({
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? "",
            text: parsed.text ?? "",
            receivedAt: new Date(),
          });
          if (messages.length > MAX_KEPT) messages.splice(0, messages.length - MAX_KEPT);
          for (const wake of waiters) wake();
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  const address = server.server.address();
  const boundPort = typeof address === "object" && address ? address.port : port;

  return {
    port: boundPort,
    messages,
    waitFor(match, timeoutMs = 10_000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          const found = messages.find(match);
          if (found) {
            waiters.delete(check);
            clearTimeout(timer);
            resolve(found);
          }
        };
        const timer = setTimeout(() => {
          waiters.delete(check);
          reject(new Error("no matching e-mail reached the SMTP fake in time"));
        }, timeoutMs);
        waiters.add(check);
        check();
      });
    },
    clear() {
      messages.length = 0;
    },
    stop() {
      return new Promise((resolve) => server.close(() => resolve()));
    },
  };
}
