/**
 * Outgoing mail over SMTP (nodemailer), configured by SMTP_HOST / SMTP_PORT /
 * MAIL_FROM. By default that is the local catcher on 127.0.0.1, so no real
 * mail leaves the machine unless someone points it elsewhere.
 */
import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

const SMTPS_PORT = 465;

export class SmtpMailer implements Mailer {
  private readonly transport: Transporter;

  constructor(private readonly config: Pick<Config, 'smtp'>) {
    const { host, port } = config.smtp;
    this.transport = nodemailer.createTransport({ host, port, secure: port === SMTPS_PORT, connectionTimeout: 5000 });
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.config.smtp.from, ...mail });
  }
}
