/**
 * The transport factory. Without SMTP_URL, mail goes over SMTP to the in-process fake (started on
 * first use), which parses each message and stores it in the OutboxMessages table; with SMTP_URL,
 * nodemailer sends through that server. Callers get a rejected promise when sending fails and
 * decide what to retry; nothing here throws into a request.
 */
import nodemailer, { type Transporter } from "nodemailer";
import type { Db } from "../db/database";
import type { Logger } from "../log";
import { startFakeSmtp, type FakeSmtp, type ReceivedMail } from "./fake-smtp";
import { headerAddress, headerText } from "./headers";
import { parseMessage } from "./parse";
import type { MailContent } from "./templates";

export interface OutgoingMail extends MailContent {
  to: { address: string; name?: string | null };
}

export interface Mailer {
  /** True when mail goes to the in-process fake and the admin outbox. */
  readonly fakeTransport: boolean;
  send(mail: OutgoingMail): Promise<{ messageId: string }>;
  close(): Promise<void>;
}

// Short timeouts: a hanging mail server must fail a send (to be retried), not hold it for minutes.
const TIMEOUTS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 20_000 };

export async function storeReceivedMail(db: Db, mail: ReceivedMail): Promise<void> {
  const parsed = parseMessage(mail.raw);
  await db.write((transaction) =>
    db.models.OutboxMessage.create(
      {
        messageId: parsed.messageId?.slice(0, 255) ?? null,
        fromAddress: (parsed.from || mail.envelopeFrom).slice(0, 320),
        toAddress: mail.envelopeTo.join(", ").slice(0, 1000),
        subject: parsed.subject.slice(0, 500),
        text: parsed.text,
        html: parsed.html,
        sizeBytes: mail.raw.length,
        receivedAt: new Date(),
      },
      { transaction },
    ),
  );
}

export function createMailer(options: {
  smtpUrl: string | undefined;
  from: { name: string; address: string };
  db: Db;
  logger: Logger;
}): Mailer {
  const { db, logger } = options;
  let fake: Promise<FakeSmtp> | null = null;
  let transport: Promise<Transporter> | null = null;
  let closed = false;

  const getTransport = (): Promise<Transporter> => {
    transport ??= (async () => {
      if (options.smtpUrl) return nodemailer.createTransport(options.smtpUrl, TIMEOUTS as never);
      fake ??= startFakeSmtp((mail) => storeReceivedMail(db, mail));
      const { port } = await fake;
      logger.info("mail goes to the in-process SMTP fake; read it at /admin/outbox", { port });
      return nodemailer.createTransport({ host: "127.0.0.1", port, secure: false, ignoreTLS: true, ...TIMEOUTS });
    })();
    // A failed start (e.g. no free port) must not be cached forever.
    transport.catch(() => {
      transport = null;
      fake = null;
    });
    return transport;
  };

  return {
    fakeTransport: !options.smtpUrl,
    async send(mail) {
      if (closed) throw new Error("The mailer is closed.");
      const to = headerAddress(mail.to.address);
      const name = mail.to.name ? headerText(mail.to.name, 120) : "";
      const t = await getTransport();
      const info = await t.sendMail({
        from: { name: headerText(options.from.name, 80), address: headerAddress(options.from.address) },
        to: name ? { name, address: to } : to,
        subject: headerText(mail.subject),
        text: mail.text,
        html: mail.html,
        // No user-controlled headers are ever passed: only the fields above.
      });
      return { messageId: String(info.messageId ?? "") };
    },
    async close() {
      closed = true;
      const t = await transport?.catch(() => null);
      t?.close();
      const f = await fake?.catch(() => null);
      await f?.close();
    },
  };
}
