// The business side of a job (quotes, payments, e-mail, invitations, files, build stages):
// registered on the same Sequelize instance as the foundation models by initBusinessModels().
import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { QuoteLine, QuoteStatus } from '@/lib/validation/quote';

const uuidPk = { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 };
// DECIMAL comes back from pg as a string: read it as a number.
const decimal = (name: string) => ({
  type: DataTypes.DECIMAL(6, 2),
  allowNull: false,
  get(this: Model) {
    return Number(this.getDataValue(name));
  },
});

export class QuoteSettings extends Model<
  InferAttributes<QuoteSettings>,
  InferCreationAttributes<QuoteSettings>
> {
  declare firmId: string;
  declare marginPercent: number;
  declare taxLabel: string;
  declare taxRatePercent: number;
  declare depositPercent: number;
  declare validityDays: number;
  declare crewDayRate: number;
  declare labourRatePerM2: number;
  declare terms: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Quote extends Model<InferAttributes<Quote>, InferCreationAttributes<Quote>> {
  declare id: CreationOptional<string>;
  declare firmId: string;
  declare jobId: string;
  declare designId: string | null;
  declare designVersion: number | null;
  declare number: number;
  declare title: string;
  declare status: CreationOptional<QuoteStatus>;
  declare revision: CreationOptional<number>;
  declare lines: QuoteLine[];
  declare currency: string;
  declare marginPercent: number;
  declare taxLabel: string;
  declare taxRatePercent: number;
  declare depositPercent: number;
  declare validUntil: string;
  declare terms: string;
  declare note: CreationOptional<string>;
  declare sentAt: CreationOptional<Date | null>;
  declare sentTo: CreationOptional<string | null>;
  declare sentRevision: CreationOptional<number | null>;
  declare linkExpiresAt: CreationOptional<Date | null>;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedName: CreationOptional<string | null>;
  declare declinedAt: CreationOptional<Date | null>;
  declare declineReason: CreationOptional<string | null>;
  declare createdById: string | null;
  declare updatedById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class QuoteRevision extends Model<
  InferAttributes<QuoteRevision>,
  InferCreationAttributes<QuoteRevision>
> {
  declare id: CreationOptional<string>;
  declare firmId: string;
  declare quoteId: string;
  declare revision: number;
  declare snapshot: Record<string, unknown>;
  declare savedById: string | null;
  declare savedAt: CreationOptional<Date>;
}

export type PaymentStatus = 'pending' | 'paid' | 'failed' | 'expired';

export class Payment extends Model<InferAttributes<Payment>, InferCreationAttributes<Payment>> {
  declare id: CreationOptional<string>;
  declare firmId: string;
  declare quoteId: string;
  declare jobId: string;
  declare provider: CreationOptional<string>;
  declare checkoutSessionId: string;
  declare amount: number;
  declare currency: string;
  declare status: CreationOptional<PaymentStatus>;
  declare paidAt: CreationOptional<Date | null>;
  declare providerEventId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class WebhookEvent extends Model<
  InferAttributes<WebhookEvent>,
  InferCreationAttributes<WebhookEvent>
> {
  declare provider: string;
  declare eventId: string;
  declare type: string;
  declare payload: Record<string, unknown>;
  declare receivedAt: CreationOptional<Date>;
  declare deliveries: CreationOptional<number>;
}

export type EmailKind = 'quote' | 'plan' | 'order' | 'invitation' | 'receipt' | 'other';
export type EmailStatus = 'queued' | 'sending' | 'sent' | 'retrying' | 'failed';
export interface StoredAttachment {
  filename: string;
  contentType: string;
  /** base64 */
  content: string;
}

export class EmailMessage extends Model<
  InferAttributes<EmailMessage>,
  InferCreationAttributes<EmailMessage>
> {
  declare id: CreationOptional<string>;
  declare firmId: string | null;
  declare kind: EmailKind;
  declare toAddress: string;
  declare fromAddress: string;
  declare replyTo: CreationOptional<string | null>;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: CreationOptional<string | null>;
  declare attachments: CreationOptional<StoredAttachment[]>;
  declare status: CreationOptional<EmailStatus>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare nextAttemptAt: CreationOptional<Date>;
  declare lockedUntil: CreationOptional<Date | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare providerMessageId: CreationOptional<string | null>;
  declare jobId: CreationOptional<string | null>;
  declare quoteId: CreationOptional<string | null>;
  declare createdById: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export class Invitation extends Model<
  InferAttributes<Invitation>,
  InferCreationAttributes<Invitation>
> {
  declare id: CreationOptional<string>;
  declare firmId: string;
  declare email: string;
  declare name: string;
  declare role: 'designer' | 'crew';
  declare tokenHash: string;
  declare invitedById: string | null;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedUserId: CreationOptional<string | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export const BUILD_STAGES = ['set_out', 'footings', 'frame', 'boards', 'finished'] as const;
export type BuildStageName = (typeof BUILD_STAGES)[number];

export class BuildStage extends Model<
  InferAttributes<BuildStage>,
  InferCreationAttributes<BuildStage>
> {
  declare id: CreationOptional<string>;
  declare firmId: string;
  declare jobId: string;
  declare stage: BuildStageName;
  declare doneOn: string;
  declare note: CreationOptional<string>;
  declare markedById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export type JobFileKind = 'photo' | 'document';

export class JobFile extends Model<InferAttributes<JobFile>, InferCreationAttributes<JobFile>> {
  declare id: CreationOptional<string>;
  declare firmId: string;
  declare jobId: string;
  declare stageId: CreationOptional<string | null>;
  declare kind: JobFileKind;
  declare storageKey: string;
  declare thumbKey: CreationOptional<string | null>;
  declare mime: string;
  declare sizeBytes: number;
  declare originalName: string;
  declare width: CreationOptional<number | null>;
  declare height: CreationOptional<number | null>;
  declare caption: CreationOptional<string>;
  declare uploadedById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** Registers the business models on `sequelize` (idempotent per instance). */
export function initBusinessModels(sequelize: Sequelize) {
  const opts = (tableName: string, modelName: string) => ({
    sequelize,
    tableName,
    modelName,
    underscored: true,
  });
  QuoteSettings.init(
    {
      firmId: { type: DataTypes.UUID, primaryKey: true },
      marginPercent: decimal('marginPercent'),
      taxLabel: { type: DataTypes.TEXT, allowNull: false },
      taxRatePercent: decimal('taxRatePercent'),
      depositPercent: decimal('depositPercent'),
      validityDays: { type: DataTypes.INTEGER, allowNull: false },
      crewDayRate: { type: DataTypes.INTEGER, allowNull: false },
      labourRatePerM2: { type: DataTypes.INTEGER, allowNull: false, field: 'labour_rate_per_m2' },
      terms: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    opts('quote_settings', 'QuoteSettings'),
  );
  Quote.init(
    {
      id: uuidPk,
      firmId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      designId: { type: DataTypes.UUID, allowNull: true },
      designVersion: { type: DataTypes.INTEGER, allowNull: true },
      number: { type: DataTypes.INTEGER, allowNull: false },
      title: { type: DataTypes.TEXT, allowNull: false },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
      revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      lines: { type: DataTypes.JSONB, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      marginPercent: decimal('marginPercent'),
      taxLabel: { type: DataTypes.TEXT, allowNull: false },
      taxRatePercent: decimal('taxRatePercent'),
      depositPercent: decimal('depositPercent'),
      validUntil: { type: DataTypes.DATEONLY, allowNull: false },
      terms: { type: DataTypes.TEXT, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      sentAt: DataTypes.DATE,
      sentTo: DataTypes.TEXT,
      sentRevision: DataTypes.INTEGER,
      linkExpiresAt: DataTypes.DATE,
      acceptedAt: DataTypes.DATE,
      acceptedName: DataTypes.TEXT,
      declinedAt: DataTypes.DATE,
      declineReason: DataTypes.TEXT,
      createdById: DataTypes.UUID,
      updatedById: DataTypes.UUID,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    opts('quotes', 'Quote'),
  );
  QuoteRevision.init(
    {
      id: uuidPk,
      firmId: { type: DataTypes.UUID, allowNull: false },
      quoteId: { type: DataTypes.UUID, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      snapshot: { type: DataTypes.JSONB, allowNull: false },
      savedById: DataTypes.UUID,
      savedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    },
    { ...opts('quote_revisions', 'QuoteRevision'), timestamps: false },
  );
  Payment.init(
    {
      id: uuidPk,
      firmId: { type: DataTypes.UUID, allowNull: false },
      quoteId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      provider: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'stripe' },
      checkoutSessionId: { type: DataTypes.TEXT, allowNull: false },
      amount: { type: DataTypes.INTEGER, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'pending' },
      paidAt: DataTypes.DATE,
      providerEventId: DataTypes.TEXT,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    opts('payments', 'Payment'),
  );
  WebhookEvent.init(
    {
      provider: { type: DataTypes.TEXT, primaryKey: true },
      eventId: { type: DataTypes.TEXT, primaryKey: true },
      type: { type: DataTypes.TEXT, allowNull: false },
      payload: { type: DataTypes.JSONB, allowNull: false },
      receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      deliveries: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    },
    { ...opts('webhook_events', 'WebhookEvent'), timestamps: false },
  );
  EmailMessage.init(
    {
      id: uuidPk,
      firmId: DataTypes.UUID,
      kind: { type: DataTypes.TEXT, allowNull: false },
      toAddress: { type: DataTypes.TEXT, allowNull: false },
      fromAddress: { type: DataTypes.TEXT, allowNull: false },
      replyTo: DataTypes.TEXT,
      subject: { type: DataTypes.TEXT, allowNull: false },
      textBody: { type: DataTypes.TEXT, allowNull: false },
      htmlBody: DataTypes.TEXT,
      attachments: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'queued' },
      attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      lastError: DataTypes.TEXT,
      nextAttemptAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      lockedUntil: DataTypes.DATE,
      sentAt: DataTypes.DATE,
      providerMessageId: DataTypes.TEXT,
      jobId: DataTypes.UUID,
      quoteId: DataTypes.UUID,
      createdById: DataTypes.UUID,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    opts('email_messages', 'EmailMessage'),
  );
  Invitation.init(
    {
      id: uuidPk,
      firmId: { type: DataTypes.UUID, allowNull: false },
      email: { type: DataTypes.TEXT, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      role: { type: DataTypes.TEXT, allowNull: false },
      tokenHash: { type: DataTypes.TEXT, allowNull: false },
      invitedById: DataTypes.UUID,
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: DataTypes.DATE,
      acceptedUserId: DataTypes.UUID,
      revokedAt: DataTypes.DATE,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    opts('invitations', 'Invitation'),
  );
  BuildStage.init(
    {
      id: uuidPk,
      firmId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      stage: { type: DataTypes.TEXT, allowNull: false },
      doneOn: { type: DataTypes.DATEONLY, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      markedById: DataTypes.UUID,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    opts('build_stages', 'BuildStage'),
  );
  JobFile.init(
    {
      id: uuidPk,
      firmId: { type: DataTypes.UUID, allowNull: false },
      jobId: { type: DataTypes.UUID, allowNull: false },
      stageId: DataTypes.UUID,
      kind: { type: DataTypes.TEXT, allowNull: false },
      storageKey: { type: DataTypes.TEXT, allowNull: false },
      thumbKey: DataTypes.TEXT,
      mime: { type: DataTypes.TEXT, allowNull: false },
      sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
      originalName: { type: DataTypes.TEXT, allowNull: false },
      width: DataTypes.INTEGER,
      height: DataTypes.INTEGER,
      caption: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      uploadedById: DataTypes.UUID,
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    opts('job_files', 'JobFile'),
  );
  return {
    QuoteSettings,
    Quote,
    QuoteRevision,
    Payment,
    WebhookEvent,
    EmailMessage,
    Invitation,
    BuildStage,
    JobFile,
  };
}
