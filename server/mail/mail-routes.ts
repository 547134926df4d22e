/**
 * The development-only caught-mail page: admins read what the local catcher
 * caught (invitations, reset links). Not mounted in production.
 */
import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import { requireRole } from '../auth/principal';
import type { CaughtMail, CaughtMailStore } from './caught-mail-store';

const escapeHtml = (text: string) =>
  text.replace(/[&<>"']/g, (character) => `&#${character.charCodeAt(0)};`);

function page(messages: CaughtMail[]): string {
  const items = messages
    .map((mail) => `<article><h2>${escapeHtml(mail.subject)}</h2><p>To ${escapeHtml(mail.to.join(', '))} · ${escapeHtml(mail.receivedAt)}</p><pre>${escapeHtml(mail.text)}</pre></article>`)
    .join('\n');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Caught mail · Linewright (development)</title></head>
<body><h1>Caught mail (development only; nothing was delivered)</h1>${items || '<p>No mail caught yet.</p>'}</body></html>`;
}

export function mailRoutes(contract: ApiContract, store: CaughtMailStore): Router {
  return Router().get('/dev/mail', requireRole('admin'), contract.validate('listCaughtMail'), (req, res) => {
    const messages = store.list();
    res.format({
      'application/json': () => res.json({ items: messages }),
      'text/html': () => res.type('html').send(page(messages)),
    });
  });
}
