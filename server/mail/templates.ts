import type { MailInput } from './mailer';

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function message(to: string, subject: string, paragraphs: string[], link?: { href: string; label: string }): MailInput {
  const text = [...paragraphs, ...(link ? [`${link.label}: ${link.href}`] : []), '', '— Junctura'].join('\n\n');
  const html = [
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    ...(link ? [`<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>`] : []),
    '<p>— Junctura</p>',
  ].join('\n');
  return { to, subject, text, html, links: link ? [link.href] : [] };
}

export function invitationMail(to: string, p: { teamName: string; role: string; inviter: string; link: string; expiresAt: Date }) {
  return message(
    to,
    `You are invited to ${p.teamName} on Junctura`,
    [
      `${p.inviter} invites you to join the team "${p.teamName}" as ${p.role}.`,
      `The link works once and until ${p.expiresAt.toUTCString()}.`,
    ],
    { href: p.link, label: 'Accept the invitation' },
  );
}

export function passwordResetMail(to: string, p: { link: string; expiresAt: Date }) {
  return message(
    to,
    'Reset your Junctura password',
    [
      'Someone asked to reset the password of this Junctura account. If it was not you, ignore this message.',
      `The link works once and until ${p.expiresAt.toUTCString()}.`,
    ],
    { href: p.link, label: 'Choose a new password' },
  );
}

export function submittedMail(to: string, p: { studyTitle: string; author: string; revision: number; link: string }) {
  return message(
    to,
    `Review requested: ${p.studyTitle}`,
    [`${p.author} submitted revision ${p.revision} of "${p.studyTitle}" for review.`],
    { href: p.link, label: 'Open the study' },
  );
}

export function reviewedMail(to: string, p: { studyTitle: string; reviewer: string; revision: number; approved: boolean; comment: string; link: string }) {
  return message(
    to,
    `${p.approved ? 'Approved' : 'Changes requested'}: ${p.studyTitle}`,
    [
      `${p.reviewer} ${p.approved ? 'approved' : 'asked for changes to'} revision ${p.revision} of "${p.studyTitle}".`,
      ...(p.comment ? [`Comment: ${p.comment}`] : []),
    ],
    { href: p.link, label: 'Open the study' },
  );
}
