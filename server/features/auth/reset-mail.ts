import { renderMail, type Mailer } from '../../lib/mail';
import { RESET_TOKEN_MINUTES } from './password-reset.service';
import type { ResetMailer, ResetMessage } from './reset-mailer';

/** The password-reset mail over SMTP: a single-use link that works for an hour. */
export class SmtpResetMailer implements ResetMailer {
  constructor(private readonly mailer: Mailer) {}

  async sendReset(message: ResetMessage): Promise<void> {
    const body = renderMail('Choose a new password', [
      { text: `Hello ${message.displayName},` },
      { text: 'Someone (we hope you) asked to reset the password of your Strapsift account. Open the link to choose a new one.' },
      { link: message.link, label: 'Choose a new password' },
      { text: `The link works once, within ${RESET_TOKEN_MINUTES} minutes. Choosing a new password signs you out everywhere else.` },
      { small: 'If you did not ask for this, ignore this mail: your password stays as it is.' },
    ]);
    await this.mailer.send({ to: message.to, subject: 'Reset your Strapsift password', ...body });
  }
}
