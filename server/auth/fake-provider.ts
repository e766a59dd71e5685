// A stand-in for the OAuth provider in development and tests: the same four endpoints the real
// one offers (authorize, token, user, e-mails), with a small page to pick or create a test account.
// Never mounted in production.
import { createHash, randomBytes } from 'node:crypto';
import express, { Router } from 'express';

interface Account {
  id: string;
  login: string;
  name: string;
  email: string;
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);

/** Ids derive from the login, so an account keeps its identity across restarts of the fake. */
const idFor = (login: string) => String(parseInt(createHash('sha256').update(login.toLowerCase()).digest('hex').slice(0, 8), 16));

export function createFakeProvider(): Router {
  const accounts = new Map<string, Account>();
  for (const [login, name] of [['test-member', 'Test Member'], ['test-admin', 'Test Admin']]) {
    accounts.set(login, { id: idFor(login), login, name, email: `${login}@example.invalid` });
  }
  const codes = new Map<string, { login: string; redirectUri: string }>();
  const tokens = new Map<string, string>();
  const router = Router();
  router.use(express.urlencoded({ extended: false }));

  router.get('/login/oauth/authorize', (req, res) => {
    const redirectUri = String(req.query.redirect_uri ?? '');
    const state = String(req.query.state ?? '');
    const hidden = `<input type="hidden" name="redirect_uri" value="${escapeHtml(redirectUri)}"><input type="hidden" name="state" value="${escapeHtml(state)}">`;
    const list = [...accounts.values()]
      .map((a) => `<li><form method="post">${hidden}<input type="hidden" name="login" value="${escapeHtml(a.login)}"><button type="submit" data-testid="fake-account-${escapeHtml(a.login)}">${escapeHtml(a.name)} <small>(${escapeHtml(a.login)})</small></button></form></li>`)
      .join('');
    res.type('html').send(`<!doctype html><html><head><meta name="viewport" content="width=device-width, initial-scale=1"><title>Test sign-in</title>
<style>body{font-family:sans-serif;max-width:28rem;margin:2rem auto;padding:0 1rem;color:#14212b}button{font-size:1rem;padding:.5rem .8rem;margin:.2rem 0}input{font-size:1rem;padding:.4rem;width:100%;box-sizing:border-box;margin:.2rem 0}</style></head>
<body><h1>Test sign-in</h1><p>This page stands in for the sign-in provider in development and tests. Pick an account or make one.</p>
<ul>${list}</ul><h2>New test account</h2><form method="post">${hidden}
<label>Login <input name="login" required pattern="[a-z0-9-]{2,39}" data-testid="fake-login"></label>
<label>Display name <input name="name" data-testid="fake-name"></label>
<label>E-mail <input name="email" type="email" data-testid="fake-email"></label>
<button type="submit" data-testid="fake-create">Continue</button></form></body></html>`);
  });

  router.post('/login/oauth/authorize', (req, res) => {
    const login = String(req.body.login ?? '').trim().toLowerCase();
    const redirectUri = String(req.body.redirect_uri ?? '');
    if (!/^[a-z0-9-]{2,39}$/.test(login) || !/^https?:\/\//.test(redirectUri)) {
      res.status(400).type('text').send('login (2-39 lower-case letters, digits, dashes) and redirect_uri are required');
      return;
    }
    if (!accounts.has(login)) {
      accounts.set(login, { id: idFor(login), login, name: String(req.body.name ?? '').trim() || login, email: String(req.body.email ?? '').trim() || `${login}@example.invalid` });
    }
    const code = randomBytes(12).toString('hex');
    codes.set(code, { login, redirectUri });
    const target = new URL(redirectUri);
    target.searchParams.set('code', code);
    if (req.body.state) target.searchParams.set('state', String(req.body.state));
    res.redirect(302, target.toString());
  });

  router.post('/login/oauth/access_token', (req, res) => {
    const grant = codes.get(String(req.body.code ?? ''));
    if (!grant) {
      res.status(400).json({ error: 'bad_verification_code' });
      return;
    }
    codes.delete(String(req.body.code));
    const token = randomBytes(16).toString('hex');
    tokens.set(token, grant.login);
    res.json({ access_token: token, token_type: 'bearer', scope: 'user:email' });
  });

  const account = (req: express.Request) => {
    const auth = req.get('authorization') ?? '';
    const token = auth.replace(/^(token|bearer)\s+/i, '');
    const login = tokens.get(token);
    return login ? accounts.get(login) : undefined;
  };
  router.get('/user', (req, res) => {
    const a = account(req);
    if (!a) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    res.json({ id: Number(a.id), login: a.login, name: a.name, email: a.email });
  });
  router.get('/user/emails', (req, res) => {
    const a = account(req);
    if (!a) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    res.json([{ email: a.email, primary: true, verified: true }]);
  });
  return router;
}
