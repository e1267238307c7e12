import type { AppDeps } from '../context';

interface PageRef {
  id: string;
  number: number;
  title: string;
  notebookTitle: string;
}

const pageLabel = (page: PageRef) => `page ${String(page.number).padStart(3, '0')} "${page.title}" in ${page.notebookTitle}`;

/**
 * Mail is a courtesy on top of the queue and the record: a failed send is logged but never undoes
 * a signature that was already recorded.
 */
async function send(deps: AppDeps, message: { to: string; subject: string; text: string }) {
  try {
    await deps.mailer.send(message);
  } catch (error) {
    console.error('signing: could not send mail', error);
  }
}

export function notifyCountersignRequested(
  deps: AppDeps,
  to: { email: string; name: string },
  from: string,
  page: PageRef,
  addendumNumber: number | null,
) {
  const what = addendumNumber ? `addendum ${addendumNumber} to ${pageLabel(page)}` : pageLabel(page);
  return send(deps, {
    to: to.email,
    subject: `Countersignature requested: ${what}`,
    text:
      `Hello ${to.name},\n\n${from} signed ${what} and asks you to countersign it.\n` +
      `Open it here to countersign or return it with a comment:\n\n${deps.config.publicUrl}/pages/${page.id}\n\n` +
      `It is also listed in your countersigning queue: ${deps.config.publicUrl}/countersign\n`,
  });
}

export function notifyReturned(deps: AppDeps, to: { email: string; name: string }, by: string, page: PageRef, comment: string, addendumNumber: number | null) {
  const what = addendumNumber ? `addendum ${addendumNumber} to ${pageLabel(page)}` : pageLabel(page);
  const after = addendumNumber
    ? 'The addendum stays in the record; you can add a further addendum.'
    : 'The page is unlocked again so you can make the changes and sign it anew.';
  return send(deps, {
    to: to.email,
    subject: `Returned with a comment: ${what}`,
    text: `Hello ${to.name},\n\n${by} returned ${what} instead of countersigning it. Their comment:\n\n${comment}\n\n${after}\n${deps.config.publicUrl}/pages/${page.id}\n`,
  });
}

export function notifyCountersigned(deps: AppDeps, to: { email: string; name: string }, by: string, page: PageRef, addendumNumber: number | null) {
  const what = addendumNumber ? `addendum ${addendumNumber} to ${pageLabel(page)}` : pageLabel(page);
  return send(deps, {
    to: to.email,
    subject: `Countersigned: ${what}`,
    text: `Hello ${to.name},\n\n${by} countersigned ${what}.\n${deps.config.publicUrl}/pages/${page.id}\n`,
  });
}
