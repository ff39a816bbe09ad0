// Guyline's e-mail layout: every message has a plain-text part and an HTML part built from the
// same blocks, in slate and copper, with inline styles only (mail clients drop style sheets)
// and no images from the network.
import { mailCategoryTopics, type MailCategory } from "./categories";

export interface MailContext {
  clubName: string;
  timeZone: string;
  /** The address Guyline is served at, without a trailing slash; every link is absolute. */
  appUrl: string;
  recipientName: string;
  /** The unsubscribe page for this message's category; null for messages that are always sent. */
  unsubscribeUrl: string | null;
}

export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

export type MailBlock =
  | { kind: "paragraph"; text: string }
  | { kind: "facts"; rows: readonly (readonly [label: string, value: string])[] }
  | { kind: "list"; title?: string; items: readonly string[] }
  /** The message's main button; `path` is a Guyline path such as /build-sessions/…, or an absolute URL. */
  | { kind: "action"; label: string; path: string }
  /** Safety cautions, in amber. */
  | { kind: "caution"; title: string; items: readonly string[] };

export interface MailBody {
  subject: string;
  heading: string;
  blocks: readonly MailBlock[];
}

/** Why a message cannot be turned off, or null when its category is the member's choice. */
export type AlwaysSentReason = string | null;

const colours = {
  slate900: "#0f172a",
  slate800: "#1e293b",
  slate600: "#475569",
  slate200: "#e2e8f0",
  slate50: "#f8fafc",
  copper700: "#7f4a1f",
  copper200: "#ebc5a6",
  caution50: "#fffbeb",
  caution600: "#b45309",
  caution800: "#78350f",
};

const fontStack = "'Atkinson Hyperlegible', Verdana, Arial, sans-serif";

export function escapeHtml(value: string): string {
  return value.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

/** A Guyline path made absolute; absolute URLs pass unchanged. */
export function absoluteUrl(appUrl: string, path: string): string {
  if (/^https?:\/\//.test(path)) return path;
  return `${appUrl.replace(/\/$/, "")}${path.startsWith("/") ? path : `/${path}`}`;
}

function blockText(block: MailBlock, appUrl: string): string {
  switch (block.kind) {
    case "paragraph":
      return block.text;
    case "facts": {
      const width = Math.max(...block.rows.map(([label]) => label.length));
      return block.rows.map(([label, value]) => `${`${label}:`.padEnd(width + 2)}${value}`).join("\n");
    }
    case "list":
      return [block.title, ...block.items.map((item) => `- ${item}`)].filter(Boolean).join("\n");
    case "action":
      return `${block.label}:\n${absoluteUrl(appUrl, block.path)}`;
    case "caution":
      return [`${block.title.toUpperCase()}`, ...block.items.map((item) => `! ${item}`)].join("\n");
  }
}

function blockHtml(block: MailBlock, appUrl: string): string {
  const paragraph = `margin:0 0 16px 0;font-size:16px;line-height:1.5;color:${colours.slate900};`;
  switch (block.kind) {
    case "paragraph":
      return `<p style="${paragraph}">${escapeHtml(block.text)}</p>`;
    case "facts":
      return `<table role="presentation" cellpadding="0" cellspacing="0" style="margin:0 0 16px 0;border-collapse:collapse;font-size:16px;line-height:1.5;">${block.rows
        .map(
          ([label, value]) =>
            `<tr><th scope="row" style="text-align:left;vertical-align:top;padding:4px 16px 4px 0;color:${colours.slate600};font-weight:bold;">${escapeHtml(label)}</th><td style="padding:4px 0;color:${colours.slate900};">${escapeHtml(value)}</td></tr>`,
        )
        .join("")}</table>`;
    case "list":
      return `${block.title ? `<p style="${paragraph}margin-bottom:4px;font-weight:bold;">${escapeHtml(block.title)}</p>` : ""}<ul style="margin:0 0 16px 0;padding-left:24px;font-size:16px;line-height:1.5;color:${colours.slate900};">${block.items
        .map((item) => `<li>${escapeHtml(item)}</li>`)
        .join("")}</ul>`;
    case "action":
      return `<p style="margin:8px 0 24px 0;"><a href="${escapeHtml(absoluteUrl(appUrl, block.path))}" style="display:inline-block;background:${colours.copper700};color:#ffffff;padding:12px 20px;border-radius:8px;font-size:16px;font-weight:bold;text-decoration:none;">${escapeHtml(block.label)}</a></p>`;
    case "caution":
      return `<div style="margin:0 0 16px 0;padding:12px 16px;background:${colours.caution50};border-left:4px solid ${colours.caution600};color:${colours.caution800};font-size:15px;line-height:1.5;"><p style="margin:0 0 4px 0;font-weight:bold;">${escapeHtml(block.title)}</p><ul style="margin:0;padding-left:20px;">${block.items
        .map((item) => `<li>${escapeHtml(item)}</li>`)
        .join("")}</ul></div>`;
  }
}

function footerLines(context: MailContext, category: MailCategory, alwaysSent: AlwaysSentReason): string[] {
  if (alwaysSent !== null) {
    return [`Guyline sends this message whatever your e-mail choices: ${alwaysSent}`];
  }
  if (!context.unsubscribeUrl) throw new Error(`A ${category} message needs its unsubscribe link.`);
  return [
    `You get this because of your e-mail choices on Guyline for ${context.clubName}.`,
    `Stop e-mails about ${mailCategoryTopics[category]}: ${context.unsubscribeUrl}`,
    `All your e-mail choices: ${absoluteUrl(context.appUrl, "/settings")}`,
  ];
}

/** Turns a message's blocks into its subject, plain-text part and HTML part. */
export function composeMail(body: MailBody, context: MailContext, category: MailCategory, alwaysSent: AlwaysSentReason): MailContent {
  const greeting = `Hello ${context.recipientName},`;
  const footer = footerLines(context, category, alwaysSent);

  const text = [
    body.heading,
    "=".repeat(Math.min(body.heading.length, 72)),
    "",
    greeting,
    "",
    ...body.blocks.flatMap((block) => [blockText(block, context.appUrl), ""]),
    `Guyline, for ${context.clubName}`,
    "--",
    ...footer,
    "",
  ].join("\n");

  const footerHtml = footer
    .map((line) => {
      const html = escapeHtml(line).replace(/(https?:\/\/[^\s<]+)/g, (url) => `<a href="${url}" style="color:${colours.copper700};">${url}</a>`);
      return `<p style="margin:0 0 8px 0;">${html}</p>`;
    })
    .join("");

  const html = `<!DOCTYPE html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(body.subject)}</title></head>
<body style="margin:0;padding:0;background:${colours.slate50};font-family:${fontStack};">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background:${colours.slate50};">
<tr><td align="center" style="padding:24px 12px;">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="max-width:600px;background:#ffffff;border:1px solid ${colours.slate200};border-radius:12px;">
<tr><td style="background:${colours.slate800};padding:16px 24px;border-radius:12px 12px 0 0;border-bottom:4px solid ${colours.copper700};">
<p style="margin:0;font-size:22px;font-weight:bold;color:#ffffff;font-family:${fontStack};">Guyline</p>
<p style="margin:0;font-size:14px;color:${colours.copper200};font-family:${fontStack};">${escapeHtml(context.clubName)}</p>
</td></tr>
<tr><td style="padding:24px;font-family:${fontStack};">
<h1 style="margin:0 0 16px 0;font-size:22px;line-height:1.3;color:${colours.slate900};">${escapeHtml(body.heading)}</h1>
<p style="margin:0 0 16px 0;font-size:16px;line-height:1.5;color:${colours.slate900};">${escapeHtml(greeting)}</p>
${body.blocks.map((block) => blockHtml(block, context.appUrl)).join("\n")}
</td></tr>
<tr><td style="padding:16px 24px;border-top:1px solid ${colours.slate200};font-size:13px;line-height:1.5;color:${colours.slate600};font-family:${fontStack};">
${footerHtml}
</td></tr>
</table>
</td></tr>
</table>
</body>
</html>
`;
  return { subject: body.subject, text, html };
}
