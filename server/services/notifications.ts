import { Op } from 'sequelize';
import { Excerpt, Source, User } from '../models';
import { sendMail } from '../mail/mailer';
import { afterSubmit } from '../commands/submit-source';
import { mailTemplates } from '../mail/templates';
import { publicUrl } from '../config';
import { formatLocator } from '@shared/catalogue/locator';
import { fieldLabel } from '@shared/review/fields';
import type { ReviewDecision } from '@shared/catalogue/vocabulary';
import type { EntityKind, FieldComment } from '@shared/review/types';

const pastTense: Record<ReviewDecision, string> = { approve: 'approved', return: 'returned for changes', reject: 'rejected' };

/** The review page of an item, for editors. */
export const reviewUrl = (kind: EntityKind, publicId: string) => `${publicUrl()}/review/${kind}/${publicId}`;
/** The contributor's view of one submission, with the editors' comments. */
export const submissionUrl = (kind: EntityKind, publicId: string) => `${publicUrl()}/submissions/${kind}/${publicId}`;

async function describe(item: Source | Excerpt): Promise<{ kind: EntityKind; title: string }> {
  if (item instanceof Source) return { kind: 'source', title: item.title };
  const source = item.source ?? (await Source.findByPk(item.sourceId));
  return { kind: 'excerpt', title: `${source?.title ?? 'Excerpt'}, ${formatLocator(item.locatorType, item.locatorValue)}` };
}

/**
 * Tells every active editor (and admin) that something awaits review. Call it after
 * the submit transaction commits; the submitter is left out. Mail failures are logged only.
 */
export async function notifyEditorsOfSubmission(item: Source | Excerpt, options: { excerpts?: number } = {}): Promise<void> {
  const { kind, title } = await describe(item);
  const [editors, contributor] = await Promise.all([
    User.findAll({ where: { role: { [Op.in]: ['editor', 'admin'] }, active: true, id: { [Op.ne]: item.contributorId } } }),
    User.findByPk(item.contributorId),
  ]);
  const heading = options.excerpts ? `${title} (with ${options.excerpts} excerpt${options.excerpts === 1 ? '' : 's'})` : title;
  const message = mailTemplates.newSubmission(contributor?.displayName ?? 'A contributor', heading, reviewUrl(kind, item.publicId));
  await Promise.all(editors.map((editor) => sendMail(editor.email, message)));
}

/** Tells the contributor what the editor decided, with the comments and a link to the submission. */
export async function notifyContributorOfDecision(
  item: Source | Excerpt,
  decision: { decision: ReviewDecision; comment: string | null; fieldComments: FieldComment[]; alsoApproved?: number },
): Promise<void> {
  const [{ kind, title }, contributor] = await Promise.all([describe(item), User.findByPk(item.contributorId)]);
  if (!contributor || !contributor.active) return;
  const notes = decision.fieldComments.map((c) => `${fieldLabel(kind, c.field)}: ${c.comment}`);
  const extra = decision.alsoApproved ? `${decision.alsoApproved} excerpt(s) awaiting review were approved with the source.` : null;
  const comment = [decision.comment, extra].filter(Boolean).join(' ') || null;
  await sendMail(
    contributor.email,
    mailTemplates.decision(contributor.displayName, title, pastTense[decision.decision], comment, submissionUrl(kind, item.publicId), notes),
  );
}

/**
 * Mails the editors after every source submission (the catalogue's submit command runs
 * its `afterSubmit` hooks once the transaction has committed). When only new excerpts of
 * an approved source went to review, each excerpt gets its own notice.
 */
afterSubmit.push(async ({ source, excerpts }) => {
  if (source.status === 'submitted') await notifyEditorsOfSubmission(source, { excerpts: excerpts.length });
  else for (const excerpt of excerpts) await notifyEditorsOfSubmission(excerpt);
});
