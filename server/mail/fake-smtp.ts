/**
 * The in-process SMTP fake used by default (demo and tests): a real SMTP server from smtp-server on
 * 127.0.0.1 and a free port, so nodemailer goes through the same SMTP path as in production. Each
 * message is handed to `onMessage` (which stores it in the outbox) before the server acknowledges it.
 */
import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";

export interface FakeSmtp {
  port: number;
  close(): Promise<void>;
}

export interface ReceivedMail {
  raw: Buffer;
  envelopeFrom: string;
  envelopeTo: string[];
}

const MAX_MESSAGE_BYTES = 1_000_000;

export async function startFakeSmtp(onMessage: (mail: ReceivedMail) => Promise<void>): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      let size = 0;
      stream.on("data", (chunk: Buffer) => {
        size += chunk.length;
        if (size <= MAX_MESSAGE_BYTES) chunks.push(chunk);
      });
      stream.on("error", (err) => callback(err));
      stream.on("end", () => {
        if (stream.sizeExceeded || size > MAX_MESSAGE_BYTES) return callback(new Error("Message too large"));
        const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : "";
        onMessage({ raw: Buffer.concat(chunks), envelopeFrom, envelopeTo: session.envelope.rcptTo.map((r) => r.address) }).then(
          () => callback(null),
          (err: unknown) => callback(err instanceof Error ? err : new Error(String(err))),
        );
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.server.once("error", reject);
    server.listen(0, "127.0.0.1", () => resolve());
  });
  // Never keep the process alive just for the fake.
  server.server.unref();
  const { port } = server.server.address() as AddressInfo;
  return {
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
