// The inbox a person trying the demo opens: every e-mail the fake accepted, newest first, and each
// one rendered in a sandboxed frame, with its links repeated outside the frame so they are easy to
// click (a magic link or an invitation).
import type { StoredMessage } from "./store";

const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

const STYLE = `
  body { font: 15px/1.5 system-ui, sans-serif; margin: 0; background: #fbf8f1; color: #1c1f21; }
  header { background: #712e28; color: #fff; padding: 12px 20px; display: flex; gap: 16px; align-items: baseline; flex-wrap: wrap; }
  header a { color: #fff; } main { padding: 16px 20px; max-width: 980px; }
  table { border-collapse: collapse; width: 100%; background: #fff; } td, th { text-align: left; padding: 6px 10px; border-bottom: 1px solid #ebe0c4; vertical-align: top; }
  th { font-size: 12px; text-transform: uppercase; letter-spacing: .05em; background: #f5efe0; }
  a { color: #712e28; } .muted { color: #626b70; font-size: 13px; } iframe { width: 100%; height: 620px; border: 1px solid #ebe0c4; background: #fff; }
  pre { white-space: pre-wrap; background: #fff; border: 1px solid #ebe0c4; padding: 10px; } form { display: inline; }
  ul.links li { margin: 4px 0; word-break: break-all; }
`;

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${esc(title)}</title><style>${STYLE}</style></head><body><header><strong>Scalewright e-mail fake</strong><a href="/inbox">Inbox</a><span class="muted" style="color:#f5e2dd">Nothing here leaves this machine.</span></header><main>${body}</main></body></html>`;
}

export function inboxPage(messages: StoredMessage[], to?: string): string {
  const rows = messages
    .map(
      (m) =>
        `<tr><td class="muted">${esc(new Date(m.createdAt).toISOString().replace("T", " ").slice(0, 19))} UTC</td><td>${esc(m.to.join(", "))}</td><td><a href="/inbox/${esc(m.id)}">${esc(m.subject)}</a></td></tr>`,
    )
    .join("");
  const filter = `<form method="get" action="/inbox"><label>Recipient <input name="to" value="${esc(to ?? "")}" placeholder="name@example.com"></label> <button>Filter</button></form>`;
  const table = messages.length
    ? `<table><thead><tr><th>Received</th><th>To</th><th>Subject</th></tr></thead><tbody>${rows}</tbody></table>`
    : `<p>No e-mail yet${to ? ` for ${esc(to)}` : ""}. Ask for a sign-in link or send an invitation, then reload.</p>`;
  return page("Inbox", `<h1>Inbox</h1><p>${filter}</p>${table}`);
}

/** Every http(s) link in an HTML body, in order, without repeats. */
export function linksIn(html: string): string[] {
  const out: string[] = [];
  for (const m of html.matchAll(/href=["'](https?:[^"']+)["']/g)) {
    const href = m[1]!.replace(/&amp;/g, "&");
    if (!out.includes(href)) out.push(href);
  }
  return out;
}

export function messagePage(m: StoredMessage): string {
  const links = m.html ? linksIn(m.html) : [];
  // Links without a target open in the whole tab (<base target="_top">); the templates' buttons
  // open a new tab as in a mail client, outside the frame's sandbox.
  const framed = m.html ? m.html.replace(/<head([^>]*)>/i, `<head$1><base target="_top">`) : "";
  return page(
    m.subject,
    `<p><a href="/inbox">← all e-mail</a></p>
     <h1>${esc(m.subject)}</h1>
     <p class="muted">From ${esc(m.from)} to ${esc(m.to.join(", "))} · ${esc(m.createdAt)} · id ${esc(m.id)}</p>
     ${links.length ? `<h2>Links in this e-mail</h2><ul class="links">${links.map((l) => `<li><a href="${esc(l)}">${esc(l)}</a></li>`).join("")}</ul>` : ""}
     ${m.html ? `<h2>As the recipient sees it</h2><iframe title="E-mail body" sandbox="allow-top-navigation-by-user-activation allow-popups allow-popups-to-escape-sandbox" srcdoc="${esc(framed)}"></iframe>` : ""}
     ${m.text ? `<h2>Plain text</h2><pre>${esc(m.text)}</pre>` : ""}`,
  );
}
