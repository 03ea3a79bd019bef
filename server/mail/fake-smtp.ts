import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";
import { logger } from "../lib/logger";
import { parseMessage, type ParsedMessage } from "./parse-message";

/** What the fake hands to `onMessage`: the parsed message plus its envelope recipients. */
export interface ReceivedMail extends ParsedMessage {
  /** Envelope recipients, comma-separated. */
  to: string;
  /** The From header (decoded), else the envelope sender. */
  from: string;
}

export interface FakeSmtpOptions {
  /** TCP port on 127.0.0.1; 0 picks a free one (tests). */
  port: number;
  /** Called for every message; the SMTP reply waits for it, so a sender that got "250" knows it is stored. */
  onMessage: (mail: ReceivedMail) => Promise<void> | void;
  /** Largest message accepted, in bytes (default 2 MB). */
  maxBytes?: number;
}

export interface FakeSmtp {
  port: number;
  close: () => Promise<void>;
}

/**
 * A local SMTP server that accepts every message on loopback and never relays it: it parses
 * the message and passes it to `onMessage` (which stores it in the outbox table). STARTTLS and
 * AUTH are disabled, so clients connect with `ignoreTLS: true` and no credentials.
 */
export async function startFakeSmtp(options: FakeSmtpOptions): Promise<FakeSmtp> {
  const server = new SMTPServer({
    disabledCommands: ["STARTTLS", "AUTH"],
    authOptional: true,
    logger: false,
    size: options.maxBytes ?? 2_000_000,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          callback(Object.assign(new Error("Message too large"), { responseCode: 552 }));
          return;
        }
        const parsed = parseMessage(Buffer.concat(chunks));
        const to = session.envelope.rcptTo.map((r) => r.address).join(", ");
        const sender = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
        Promise.resolve(options.onMessage({ ...parsed, to, from: parsed.fromHeader || sender }))
          .then(() => callback())
          .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port, "127.0.0.1", () => {
      server.off("error", reject);
      resolve();
    });
  });
  // A broken client connection must not crash the host process.
  server.on("error", (err: Error) => logger.warn("fake SMTP connection error", { message: err.message }));
  const port = (server.server.address() as AddressInfo).port;
  return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
