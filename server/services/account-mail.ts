// The words of the e-mails about an account and its organizations: confirming a sign-up or a
// new address, telling an owner someone used theirs, and telling a dealer a farm has left.
// Each returns the subject, the text and the HTML of one message; the callers queue them.
import { env } from '../env';
import { escapeHtml } from './accounts';

export interface MailWords {
  subject: string;
  text: string;
  html: string;
}

const paragraphs = (lines: string[]) => lines.map((l) => `<p>${l}</p>`).join('');

export function signUpConfirmMail(name: string, link: string, hours: number): MailWords {
  return {
    subject: 'Confirm your e-mail address for Hourstone',
    text: [
      `Hello ${name},`,
      '',
      'Open this link to confirm your address and finish creating your Hourstone account.',
      `It works once and expires in ${hours} hours:`,
      link,
      '',
      'If you did not sign up, ignore this message: no account is made without this link.',
    ].join('\n'),
    html: paragraphs([
      `Hello ${escapeHtml(name)},`,
      `<a href="${link}">Confirm your address and finish creating your Hourstone account</a>. The link works once and expires in ${hours} hours.`,
      'If you did not sign up, ignore this message: no account is made without this link.',
    ]),
  };
}

export function signUpExistingMail(name: string): MailWords {
  const signIn = `${env.APP_URL}/sign-in`;
  const reset = `${env.APP_URL}/forgot-password`;
  return {
    subject: 'Someone tried to sign up to Hourstone with your address',
    text: [
      `Hello ${name},`,
      '',
      'Someone (perhaps you) just tried to create a Hourstone account with this e-mail address.',
      'You have an account with it already, so nothing was created and nothing changed.',
      '',
      `Sign in: ${signIn}`,
      `Forgot your password? ${reset}`,
      '',
      'If it was not you, you need not do anything.',
    ].join('\n'),
    html: paragraphs([
      `Hello ${escapeHtml(name)},`,
      'Someone (perhaps you) just tried to create a Hourstone account with this e-mail address. You have an account with it already, so nothing was created and nothing changed.',
      `<a href="${signIn}">Sign in</a> · <a href="${reset}">Forgot your password?</a>`,
      'If it was not you, you need not do anything.',
    ]),
  };
}

export function emailChangeConfirmMail(
  name: string,
  newEmail: string,
  link: string,
  hours: number,
): MailWords {
  return {
    subject: 'Confirm your new e-mail address for Hourstone',
    text: [
      `Hello ${name},`,
      '',
      `Open this link to use ${newEmail} for your Hourstone account from now on.`,
      `Until you do, your account keeps its current address. The link works once and expires in ${hours} hours:`,
      link,
      '',
      'If you did not ask for this, ignore this message.',
    ].join('\n'),
    html: paragraphs([
      `Hello ${escapeHtml(name)},`,
      `<a href="${link}">Use ${escapeHtml(newEmail)} for your Hourstone account</a>. Until you do, your account keeps its current address. The link works once and expires in ${hours} hours.`,
      'If you did not ask for this, ignore this message.',
    ]),
  };
}

export function emailChangeTakenMail(): MailWords {
  return {
    subject: 'Someone tried to move a Hourstone account to your address',
    text: [
      'Hello,',
      '',
      'Someone asked to move their Hourstone account to this e-mail address. It belongs to an',
      'account already, so nothing changed: each address signs in to one account only.',
      '',
      'If you did not expect this, you need not do anything.',
    ].join('\n'),
    html: paragraphs([
      'Hello,',
      'Someone asked to move their Hourstone account to this e-mail address. It belongs to an account already, so nothing changed: each address signs in to one account only.',
      'If you did not expect this, you need not do anything.',
    ]),
  };
}

export function emailChangedMail(name: string, newEmail: string): MailWords {
  return {
    subject: 'Your Hourstone e-mail address was changed',
    text: [
      `Hello ${name},`,
      '',
      `Your Hourstone account now signs in with ${newEmail}; mail goes there from now on.`,
      'If you did not make this change, tell a manager of your farm at once: they can remove the',
      'account from the farm, and you can ask for a new account with this address.',
    ].join('\n'),
    html: paragraphs([
      `Hello ${escapeHtml(name)},`,
      `Your Hourstone account now signs in with ${escapeHtml(newEmail)}; mail goes there from now on.`,
      'If you did not make this change, tell a manager of your farm at once: they can remove the account from the farm, and you can ask for a new account with this address.',
    ]),
  };
}

export function organizationDeletedMail(
  recipientName: string,
  organizationName: string,
  kind: 'farm' | 'dealer',
): MailWords {
  const what = kind === 'farm' ? 'farm' : 'dealer';
  const gone =
    kind === 'farm'
      ? 'Its machines, due list and service history are no longer on your board.'
      : 'It no longer sees your machines or proposes services.';
  return {
    subject: `${organizationName} has left Hourstone`,
    text: [
      `Hello ${recipientName},`,
      '',
      `${organizationName}, a ${what} linked with you, was deleted from Hourstone by its manager.`,
      gone,
      'Nothing is needed from you.',
    ].join('\n'),
    html: paragraphs([
      `Hello ${escapeHtml(recipientName)},`,
      `<strong>${escapeHtml(organizationName)}</strong>, a ${what} linked with you, was deleted from Hourstone by its manager.`,
      gone,
      'Nothing is needed from you.',
    ]),
  };
}
