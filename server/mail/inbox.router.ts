import { Router } from 'express';
import type { FakeSmtp } from './fake-smtp';

const escape = (value: string) =>
  value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
const linkify = (text: string) => escape(text).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>');

/** The local test inbox: every mail the fake SMTP server caught, newest first. Development only. */
export function inboxRouter(smtp: FakeSmtp) {
  const router = Router();
  router.get('/', (_req, res) => {
    const items = [...smtp.messages]
      .reverse()
      .map(
        (m) =>
          `<article><h2>${escape(m.subject)}</h2><p class="meta">To ${escape(m.to.join(', '))} · ${escape(m.receivedAt.replace('T', ' ').slice(0, 19))} UTC</p><pre>${linkify(m.text)}</pre></article>`,
      )
      .join('');
    res.type('html')
      .send(`<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>Faintline test inbox</title>
<style>body{font-family:system-ui,sans-serif;margin:0 auto;max-width:760px;padding:16px;background:#0f1a1f;color:#e6efe9}h1{font-size:20px}article{background:#16262d;border-radius:10px;padding:12px 16px;margin:12px 0}h2{font-size:16px;margin:0 0 4px}.meta{color:#9db3ab;font-size:13px;margin:0}pre{white-space:pre-wrap;font-size:14px}a{color:#f2b45a}</style></head>
<body><h1>Faintline test inbox</h1><p class="meta">Mail sent by this local server is caught here; nothing leaves the machine.</p>${items || '<p>No mail yet.</p>'}</body></html>`);
  });
  router.get('/messages.json', (_req, res) => res.json(smtp.messages));
  return router;
}
