// Outgoing e-mail through an outbox: every message is a row first, then sent by nodemailer to
// SMTP_URL (the local sink by default). Failures are retried with back-off and stay visible.
import nodemailer, { type Transporter } from 'nodemailer';
import { Op } from 'sequelize';
import type { EmailKind, EmailMessage, EmailStatus, StoredAttachment } from '@/models/business';
import { bdb } from './businessDb';
import { NotFound } from './errors';
import { serviceConfig } from './serviceConfig';

/** After this many failed attempts a message stops retrying on its own and shows as failed. */
export const MAX_ATTEMPTS = 5;
/** Waits before attempt n+1: 1, 2, 4, 8 ... minutes (MAIL_RETRY_BASE_MS changes the unit). */
export function backoffMs(attempts: number): number {
  const base = Number(process.env.MAIL_RETRY_BASE_MS ?? 60_000);
  return base * 2 ** Math.max(0, attempts - 1);
}
/** How long one sender holds a message before another process may try it. */
const LOCK_MS = 2 * 60_000;

export interface MailInput {
  firmId: string | null;
  kind: EmailKind;
  to: string;
  subject: string;
  text: string;
  html?: string;
  replyTo?: string;
  attachments?: { filename: string; contentType: string; content: Buffer | string }[];
  jobId?: string | null;
  quoteId?: string | null;
  createdById?: string | null;
}

const transports = new Map<string, Transporter>();

function transport(): Transporter {
  const { smtpUrl } = serviceConfig();
  let t = transports.get(smtpUrl);
  if (!t) {
    // Short timeouts: a dead mail server must not hold up the request that queued the message.
    t = nodemailer.createTransport(smtpUrl, {
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
      socketTimeout: 10_000,
    } as never);
    transports.set(smtpUrl, t);
  }
  return t;
}

/** Records the message in the outbox and tries to send it at once; returns the row as it ends. */
export async function queueMail(input: MailInput): Promise<EmailMessage> {
  const { models } = bdb();
  const attachments: StoredAttachment[] = (input.attachments ?? []).map((a) => ({
    filename: a.filename,
    contentType: a.contentType,
    content: Buffer.from(a.content).toString('base64'),
  }));
  const row = await models.EmailMessage.create({
    firmId: input.firmId,
    kind: input.kind,
    toAddress: input.to,
    fromAddress: serviceConfig().mailFrom,
    replyTo: input.replyTo ?? null,
    subject: input.subject,
    textBody: input.text,
    htmlBody: input.html ?? null,
    attachments,
    jobId: input.jobId ?? null,
    quoteId: input.quoteId ?? null,
    createdById: input.createdById ?? null,
  });
  return (await attemptSend(row.id)) ?? row;
}

/**
 * Claims the message (so two servers never send it together), sends it, and records the outcome.
 * Returns undefined when another sender holds it or it is already sent.
 */
export async function attemptSend(id: string): Promise<EmailMessage | undefined> {
  const { models, sequelize } = bdb();
  const [claimed] = (await sequelize.query(
    `UPDATE email_messages SET status = 'sending', locked_until = now() + (:lock || ' milliseconds')::interval,
       updated_at = now()
     WHERE id = :id AND status <> 'sent'
       AND (status <> 'sending' OR locked_until IS NULL OR locked_until < now())
     RETURNING id`,
    { replacements: { id, lock: String(LOCK_MS) } },
  )) as [{ id: string }[], unknown];
  if (claimed.length === 0) return undefined;
  const msg = await models.EmailMessage.findByPk(id);
  if (!msg) return undefined;
  try {
    const info = await transport().sendMail({
      from: msg.fromAddress,
      to: msg.toAddress,
      replyTo: msg.replyTo ?? undefined,
      subject: msg.subject,
      text: msg.textBody,
      html: msg.htmlBody ?? undefined,
      attachments: msg.attachments.map((a) => ({
        filename: a.filename,
        contentType: a.contentType,
        content: Buffer.from(a.content, 'base64'),
      })),
    });
    await msg.update({
      status: 'sent',
      attempts: msg.attempts + 1,
      sentAt: new Date(),
      lockedUntil: null,
      lastError: null,
      providerMessageId: info.messageId ?? null,
    });
  } catch (err) {
    const attempts = msg.attempts + 1;
    await msg.update({
      status: attempts >= MAX_ATTEMPTS ? 'failed' : 'retrying',
      attempts,
      lastError: err instanceof Error ? err.message.slice(0, 1000) : String(err),
      nextAttemptAt: new Date(Date.now() + backoffMs(attempts)),
      lockedUntil: null,
    });
  }
  return msg;
}

/** Sends every message whose retry time has come (call it from a route or a scheduler). */
export async function retryDue(limit = 20): Promise<{ tried: number; sent: number }> {
  const { models } = bdb();
  const due = await models.EmailMessage.findAll({
    attributes: ['id'],
    where: {
      [Op.or]: [
        { status: { [Op.in]: ['queued', 'retrying'] }, nextAttemptAt: { [Op.lte]: new Date() } },
        { status: 'sending', lockedUntil: { [Op.lt]: new Date() } },
      ],
    },
    order: [['nextAttemptAt', 'ASC']],
    limit,
  });
  let sent = 0;
  for (const { id } of due) {
    const r = await attemptSend(id);
    if (r?.status === 'sent') sent += 1;
  }
  return { tried: due.length, sent };
}

/** Tries a failed or waiting message again now (the owner's "Send again"). */
export async function retryNow(firmId: string, id: string): Promise<EmailMessage> {
  const { models } = bdb();
  const msg = await models.EmailMessage.findOne({ where: { id, firmId } });
  if (!msg) throw new NotFound('No such message');
  if (msg.status === 'sent') return msg;
  if (msg.status === 'failed') await msg.update({ status: 'retrying', attempts: 0 });
  return (await attemptSend(id)) ?? msg;
}

export interface OutboxItem {
  id: string;
  kind: EmailKind;
  to: string;
  subject: string;
  status: EmailStatus;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string;
  sentAt: string | null;
  createdAt: string;
  attachments: string[];
}

/** The firm's sent and waiting messages, newest first. */
export async function listOutbox(firmId: string, limit = 100): Promise<OutboxItem[]> {
  const { models } = bdb();
  const rows = await models.EmailMessage.findAll({
    where: { firmId },
    order: [['createdAt', 'DESC']],
    limit,
  });
  return rows.map((m) => ({
    id: m.id,
    kind: m.kind,
    to: m.toAddress,
    subject: m.subject,
    status: m.status,
    attempts: m.attempts,
    lastError: m.lastError ?? null,
    nextAttemptAt: m.nextAttemptAt.toISOString(),
    sentAt: m.sentAt ? m.sentAt.toISOString() : null,
    createdAt: m.createdAt.toISOString(),
    attachments: m.attachments.map((a) => a.filename),
  }));
}

export interface SinkMessage {
  id: string;
  receivedAt: string;
  envelopeTo: string[];
  from: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments: { filename: string; contentType: string; size: number }[];
}

/**
 * Messages the local SMTP sink received, for the dev inbox, limited to the recipients the firm's
 * own outbox wrote to (the sink is shared by every firm on the machine). Empty with real SMTP.
 */
export async function devInbox(
  firmId: string,
): Promise<{ enabled: boolean; items: SinkMessage[] }> {
  const { mailSinkUrl } = serviceConfig();
  if (!mailSinkUrl) return { enabled: false, items: [] };
  const { models } = bdb();
  const sent = await models.EmailMessage.findAll({
    attributes: ['providerMessageId'],
    where: { firmId, status: 'sent' },
    order: [['createdAt', 'DESC']],
    limit: 500,
  });
  const ids = new Set(sent.map((m) => m.providerMessageId).filter(Boolean));
  const res = await fetch(`${mailSinkUrl}/messages?limit=1000`, { cache: 'no-store' });
  if (!res.ok) throw new Error(`mail sink answered ${res.status}`);
  const { items } = (await res.json()) as { items: (SinkMessage & { messageId: string })[] };
  return { enabled: true, items: items.filter((m) => ids.has(m.messageId)) };
}

/** One message from the sink, only if the firm sent it. */
export async function devInboxMessage(firmId: string, id: string): Promise<SinkMessage> {
  const { mailSinkUrl } = serviceConfig();
  if (!mailSinkUrl || !/^[a-z0-9-]+$/.test(id)) throw new NotFound('No such message');
  const res = await fetch(`${mailSinkUrl}/messages/${id}`, { cache: 'no-store' });
  if (!res.ok) throw new NotFound('No such message');
  const msg = (await res.json()) as SinkMessage & { messageId: string };
  const { models } = bdb();
  const mine = await models.EmailMessage.count({
    where: { firmId, providerMessageId: msg.messageId },
  });
  if (!mine) throw new NotFound('No such message');
  return msg;
}
