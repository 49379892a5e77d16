/**
 * Every e-mail Windway sends, in one place: a plain-text part and an HTML part from
 * the same words. Values are escaped for HTML; links are absolute.
 */
export interface MailMessage {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (value: string) =>
  value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function compose(subject: string, paragraphs: string[], link?: { label: string; url: string }): MailMessage {
  const text = [...paragraphs, ...(link ? [`${link.label}: ${link.url}`] : []), '— Windway'].join('\n\n');
  const html = [
    '<div style="font-family: Georgia, serif; font-size: 16px; line-height: 1.5; color: #2a2622">',
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    link ? `<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>` : '',
    '<p style="color:#6b6259">— Windway</p></div>',
  ].join('\n');
  return { subject, text, html };
}

export const mailTemplates = {
  verifyEmail: (name: string, url: string) =>
    compose('Confirm your e-mail address for Windway', [`Dear ${name},`, 'Please confirm that this address is yours. The link works for 48 hours.'], {
      label: 'Confirm my address',
      url,
    }),
  passwordReset: (name: string, url: string) =>
    compose(
      'Reset your Windway password',
      [`Dear ${name},`, 'Someone asked to reset the password of your Windway account. If it was you, choose a new password within one hour. If not, ignore this message.'],
      { label: 'Choose a new password', url },
    ),
  invitation: (inviter: string, role: string, url: string) =>
    compose(`${inviter} invites you to Windway as ${role}`, [
      `${inviter} invites you to join Windway, a reviewed archive of primary sources on historical woodwinds, with the role “${role}”.`,
      'Set your name and password within seven days to accept.',
    ], { label: 'Accept the invitation', url }),
  newSubmission: (contributor: string, title: string, url: string) =>
    compose(`New submission to review: ${title}`, [`${contributor} submitted “${title}” for review.`], { label: 'Open the review', url }),
  /** `notes`: the editor's comments on single fields, one line each ("Translation: …"). */
  decision: (name: string, title: string, decision: string, comment: string | null, url: string, notes: string[] = []) =>
    compose(`Your submission “${title}” was ${decision}`, [
      `Dear ${name},`,
      `An editor ${decision} your submission “${title}”.`,
      ...(comment ? [`The editor wrote: ${comment}`] : []),
      ...(notes.length ? ['Comments on single fields:', ...notes] : []),
    ], { label: 'See the submission', url }),
};
