export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType?: string;
}

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: MailAttachment[];
  /** The shop the message belongs to, for the outbox list; omitted for mail sent before sign-in. */
  shopId?: string | null;
}
