import type { Response } from 'express';
import { html } from '../html.ts';
import { sendHtmlPage } from '../html-page.ts';
import type { AuthorizationRequest } from './authorization-request.ts';
import { initialsOf, type FakeIdentity } from './fake-identity.ts';

const NOTICE = 'Local sign-in stand-in — for development and tests only. No real account is used.';
const ACCENT = '#1f6f64';
const AVATAR_COLOURS = ['#1f6f64', '#8a4f9e', '#b5562b', '#2f5fa7', '#7a6a1f', '#a23b5a'];

const CSS = `
.people{list-style:none;margin:0;padding:0;display:grid;gap:.6rem}
.person{display:flex;align-items:center;gap:.85rem;width:100%;padding:.7rem .9rem;font:inherit;text-align:left;
  color:inherit;background:#fff;border:1px solid #e3dde8;border-radius:.75rem;cursor:pointer}
.person:hover{border-color:var(--accent);background:#f1f8f6}
.avatar{flex:none;display:grid;place-items:center;width:2.5rem;height:2.5rem;border-radius:50%;color:#fff;font-weight:700}
${AVATAR_COLOURS.map((colour, index) => `.avatar-${index}{background:${colour}}`).join('\n')}
.person-name{display:block;font-weight:650}
.person-email{display:block;color:#6d6976;font-size:.88rem}
.divider{display:flex;align-items:center;gap:.75rem;margin:1.6rem 0 .2rem;color:#6d6976;font-size:.88rem}
.divider::before,.divider::after{content:"";flex:1;border-top:1px solid #e3dde8}
`;

export interface AuthorizePageModel {
  request: AuthorizationRequest;
  identities: readonly FakeIdentity[];
  typed?: { email: string; name: string };
  fieldErrors?: { email?: string; name?: string };
  alert?: string;
}

function hiddenRequestFields(request: AuthorizationRequest) {
  return html`<input type="hidden" name="response_type" value="${request.response_type}" />
    <input type="hidden" name="client_id" value="${request.client_id}" />
    <input type="hidden" name="redirect_uri" value="${request.redirect_uri}" />
    <input type="hidden" name="scope" value="${request.scope}" />
    ${request.state === undefined ? '' : html`<input type="hidden" name="state" value="${request.state}" />`}`;
}

function fieldError(id: string, message: string | undefined) {
  return message ? html`<p class="field-error" id="${id}">${message}</p>` : '';
}

/** The page where a developer or a test picks who to sign in as. */
export function sendAuthorizePage(res: Response, model: AuthorizePageModel, status = 200): void {
  const { request, identities, typed, fieldErrors = {} } = model;
  const people = identities.map(
    (person, index) =>
      html`<li>
        <button class="person" type="submit" name="identity" value="${person.sub}">
          <span class="avatar avatar-${index % AVATAR_COLOURS.length}" aria-hidden="true">${initialsOf(person)}</span>
          <span><span class="person-name">${person.name}</span><span class="person-email">${person.email}</span></span>
        </button>
      </li>`,
  );
  const body = html`<h1>Choose who to sign in as</h1>
    <p class="lead">to continue to <strong>${new URL(request.redirect_uri).host}</strong></p>
    ${model.alert ? html`<p class="alert" role="alert">${model.alert}</p>` : ''}
    ${
      identities.length > 0
        ? html`<form method="post" action="/authorize">
              ${hiddenRequestFields(request)}
              <ul class="people">
                ${people}
              </ul>
            </form>
            <p class="divider">or sign in as someone new</p>`
        : ''
    }
    <form method="post" action="/authorize" novalidate>
      ${hiddenRequestFields(request)}
      <label for="email">E-mail address</label>
      <input
        id="email"
        name="email"
        type="email"
        autocomplete="email"
        required
        value="${typed?.email ?? ''}"
        aria-invalid="${fieldErrors.email ? 'true' : 'false'}"
        ${fieldErrors.email ? html` aria-describedby="email-error"` : ''}
      />
      ${fieldError('email-error', fieldErrors.email)}
      <label for="name">Name <span class="muted">(optional)</span></label>
      <input
        id="name"
        name="name"
        type="text"
        autocomplete="name"
        maxlength="100"
        value="${typed?.name ?? ''}"
        aria-invalid="${fieldErrors.name ? 'true' : 'false'}"
        ${fieldErrors.name ? html` aria-describedby="name-error"` : ''}
      />
      ${fieldError('name-error', fieldErrors.name)}
      <button class="primary" type="submit">Continue with this e-mail</button>
    </form>
    <p class="muted">The same e-mail address always signs in as the same person.</p>`;
  sendHtmlPage(res, { status, title: 'Sign in — local stand-in', notice: NOTICE, accent: ACCENT, css: CSS, body });
}

/** Shown instead of redirecting when the request cannot safely be sent back to the client. */
export function sendAuthorizeErrorPage(res: Response, problems: readonly string[]): void {
  const body = html`<h1>This sign-in link is incomplete</h1>
    <p class="lead">
      The app that sent you here did not ask in a way this stand-in can answer, so nothing was sent back to it.
    </p>
    <ul>
      ${problems.map((problem) => html`<li>${problem}</li>`)}
    </ul>
    <p class="muted">
      Expected: GET /authorize?response_type=code&amp;client_id=…&amp;redirect_uri=http(s)://…&amp;scope=…&amp;state=…
    </p>`;
  sendHtmlPage(res, { status: 400, title: 'Sign-in link incomplete', notice: NOTICE, accent: ACCENT, css: '', body });
}
