import type { OutgoingMail } from './mail.service';

/** The words of every mail the product sends, with the values escaped for the HTML part. */
export type MailContent = Pick<OutgoingMail, 'subject' | 'text' | 'html'>;

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (char) => `&#${char.charCodeAt(0)};`);
}

export const MailTemplates = {
  invitation(input: { inviter: string; shopName: string; role: string; link: string }): MailContent {
    const { inviter, shopName, role, link } = input;
    return {
      subject: `${shopName} invites you to Swapwright`,
      text:
        `${inviter} invites you to join ${shopName} on Swapwright as ${role}.\n\n` +
        `Open this link within 7 days to choose your name and password:\n\n${link}\n`,
      html:
        `<p>${escapeHtml(inviter)} invites you to join <strong>${escapeHtml(shopName)}</strong> on Swapwright as ${escapeHtml(role)}.</p>` +
        `<p><a href="${escapeHtml(link)}">Accept the invitation</a> within 7 days to choose your name and password.</p>`,
    };
  },

  passwordReset(input: { name: string; link: string }): MailContent {
    const { name, link } = input;
    return {
      subject: 'Reset your Swapwright password',
      text:
        `Hello ${name},\n\nSomeone (hopefully you) asked to reset the password of your Swapwright account.\n` +
        `Open this link within 30 minutes to choose a new one; it works once:\n\n${link}\n\n` +
        `If you did not ask for this, ignore this e-mail: your password stays as it is.\n`,
      html:
        `<p>Hello ${escapeHtml(name)},</p><p>Someone (hopefully you) asked to reset the password of your Swapwright account.</p>` +
        `<p><a href="${escapeHtml(link)}">Choose a new password</a> within 30 minutes; the link works once.</p>` +
        `<p>If you did not ask for this, ignore this e-mail: your password stays as it is.</p>`,
    };
  },

  signUpLink(input: { name: string; shopName: string; link: string }): MailContent {
    const { name, shopName, link } = input;
    return {
      subject: 'Finish creating your Swapwright shop',
      text:
        `Hello ${name},\n\nOpen this link within 24 hours to create your shop "${shopName}" on Swapwright; ` +
        `it works once:\n\n${link}\n\nIf you did not sign up, ignore this e-mail: no account is created.\n`,
      html:
        `<p>Hello ${escapeHtml(name)},</p><p><a href="${escapeHtml(link)}">Create your shop “${escapeHtml(shopName)}”</a> ` +
        `within 24 hours; the link works once.</p><p>If you did not sign up, ignore this e-mail: no account is created.</p>`,
    };
  },

  signUpAlreadyRegistered(input: { name: string; signInLink: string; resetLink: string }): MailContent {
    const { name, signInLink, resetLink } = input;
    return {
      subject: 'Someone tried to create a Swapwright account with your address',
      text:
        `Hello ${name},\n\nSomeone (perhaps you) tried to create a new Swapwright account with this e-mail address, ` +
        `which already has one. Nothing was changed.\n\nSign in: ${signInLink}\n` +
        `Forgot the password? Reset it: ${resetLink}\n\nIf it was not you, you can ignore this e-mail.\n`,
      html:
        `<p>Hello ${escapeHtml(name)},</p><p>Someone (perhaps you) tried to create a new Swapwright account with this ` +
        `e-mail address, which already has one. Nothing was changed.</p><p><a href="${escapeHtml(signInLink)}">Sign in</a>, or ` +
        `<a href="${escapeHtml(resetLink)}">reset the password</a> if you forgot it.</p><p>If it was not you, you can ignore this e-mail.</p>`,
    };
  },
};
