// The words of the account e-mails. Links carry the token after "#", so it never reaches
// a server log or a Referer header; the app reads it from the page address.
import type { MailMessage } from '../mail/mail-message.js';

export function setPasswordLink(appUrl: string, token: string): string {
  return `${appUrl}/set-password#token=${token}`;
}

export function invitationMail(to: { email: string; name: string }, organisation: string, link: string, hours: number): MailMessage {
  return {
    to: to.email,
    subject: `You are invited to ${organisation} on Plumbline`,
    text: [
      `Hello ${to.name},`,
      '',
      `You have been given an account at ${organisation} on Plumbline, for survey fieldwork.`,
      'Choose your password here to start:',
      '',
      link,
      '',
      `The link works once and for ${hours} hours. If it has expired, ask your administrator to send a new one.`,
      'If you did not expect this, you can ignore this message.',
    ].join('\n'),
  };
}

export function passwordResetMail(to: { email: string; name: string }, link: string, hours: number): MailMessage {
  return {
    to: to.email,
    subject: 'Choose a new Plumbline password',
    text: [
      `Hello ${to.name},`,
      '',
      'Someone (perhaps you, or your administrator) asked to reset the password of your Plumbline account.',
      'Choose a new password here:',
      '',
      link,
      '',
      `The link works once and for ${hours} ${hours === 1 ? 'hour' : 'hours'}. Your current password keeps working until you choose a new one.`,
      'If you did not ask for this, you can ignore this message.',
    ].join('\n'),
  };
}

export function alreadyRegisteredMail(to: { email: string; name: string }, appUrl: string): MailMessage {
  return {
    to: to.email,
    subject: 'You already have a Plumbline account',
    text: [
      `Hello ${to.name},`,
      '',
      'Someone tried to create a new organisation on Plumbline with this address, which already has an account.',
      `Sign in at ${appUrl}/sign-in; if you forgot your password, choose "Forgot your password?" there.`,
    ].join('\n'),
  };
}
