import { describe, expect, it } from "vitest";
import type { MailContext } from "@/lib/mail/layout";
import { mailTemplates, renderTemplate, type TemplateData, type TemplateName } from "@/lib/mail/templates";
import type { MailTemplate } from "@/lib/mail/templates/define";

const appUrl = "https://guyline.example.org";
const context = (unsubscribe: boolean): MailContext => ({
  clubName: "Test <Radio> Circle",
  timeZone: "Europe/London",
  appUrl,
  recipientName: "Robin O'Hara",
  unsubscribeUrl: unsubscribe ? `${appUrl}/unsubscribe/u1.token.sig` : null,
});

// A summer Saturday: 09:00Z is 10:00 on London's wall clock (BST).
const startsAt = "2026-06-13T09:00:00.000Z";
const endsAt = "2026-06-13T12:30:00.000Z";
const day = { name: "Summer antenna day", startsAt, endsAt, siteName: "Hollow Lane field", meetingPoint: "The north gate", path: "/antenna-days/d1" };
const shift = { dayName: "Summer antenna day", stationName: "Station 2", bands: ["40m", "20m"], startsAt, endsAt, siteName: "Hollow Lane field", path: "/antenna-days/d1" };
const session = { title: "Build a 20 m dipole", startsAt, endsAt, place: "Village hall", mentorNames: ["Ada", "Bram"], path: "/build-sessions/abc" };

const samples: { [N in TemplateName]: TemplateData<N> } = {
  invitation: { inviterName: "Ada", roleLabel: "Member", isMentor: true, acceptPath: "/invite/tok", expiresAt: endsAt },
  signInHelp: { resetPath: "/reset-password/tok", expiresAt: endsAt },
  antennaDayPublished: { ...day, summary: "Four stations." },
  antennaDayChanged: { ...day, changes: ["Starts an hour later"] },
  antennaDayCancelled: { ...day, reason: "Storm warning" },
  shiftReminder: shift,
  shiftRemoved: shift,
  buildSessionConfirmed: { ...session, bring: ["Wire cutters (bring)"] },
  buildSessionWaitlisted: { ...session, position: 2 },
  buildSessionPromoted: { ...session, bring: ["Wire cutters (bring)"] },
  buildSessionReminder: { ...session, bring: ["Wire cutters (bring)"] },
  buildSessionChanged: { ...session, changes: ["New place: Scout hut"] },
  buildSessionCancelled: { ...session, reason: null },
  bookingApproved: { itemName: "Analyser A", from: startsAt, until: endsAt, path: "/lending", pickup: "Bram's shed" },
  bookingDeclined: { itemName: "Analyser A", from: startsAt, until: endsAt, path: "/lending", reason: "Out for calibration" },
  waitlistOffer: { itemName: "Analyser A", from: startsAt, until: endsAt, path: "/lending", expiresAt: endsAt },
  itemDueTomorrow: { items: [{ name: "Coax run 20 m", dueAt: endsAt }], path: "/lending" },
  itemOverdue: { itemName: "Coax run 20 m", dueAt: startsAt, daysOverdue: 3, path: "/lending" },
  returnReceipt: { itemName: "Coax run 20 m", returnedAt: endsAt, receivedBy: "Bram", condition: "Good", notes: null, path: "/lending" },
};

function render<N extends TemplateName>(name: N) {
  const template = mailTemplates[name] as MailTemplate<TemplateData<N>>;
  return { template, content: renderTemplate(template, samples[name], context(template.alwaysSent === null)) };
}

const names = Object.keys(mailTemplates) as TemplateName[];

describe("mail templates", () => {
  it.each(names)("%s has a subject, a plain-text part and an HTML part with the same greeting", (name) => {
    const { content } = render(name);
    expect(content.subject.length).toBeGreaterThan(5);
    expect(content.text).toContain("Hello Robin O'Hara,");
    expect(content.html).toContain("Hello Robin O&#39;Hara,");
    expect(content.html.startsWith("<!DOCTYPE html>")).toBe(true);
  });

  it.each(names)("%s loads nothing from the network and links only to Guyline", (name) => {
    const { content } = render(name);
    expect(content.html).not.toMatch(/<img|<link|<script|url\(/i);
    const links = [...content.html.matchAll(/href="([^"]+)"/g)].map((match) => match[1]);
    expect(links.length).toBeGreaterThan(0);
    for (const link of links) expect(link.startsWith(`${appUrl}/`)).toBe(true);
    for (const url of content.text.match(/https?:\/\/\S+/g) ?? []) expect(url.startsWith(`${appUrl}/`)).toBe(true);
  });

  it.each(names)("%s escapes what people typed into the HTML", (name) => {
    const { content } = render(name);
    expect(content.html).toContain("Test &lt;Radio&gt; Circle");
    expect(content.html).not.toContain("Test <Radio> Circle");
    expect(content.text).toContain("Test <Radio> Circle");
  });

  it("puts the unsubscribe link in every message the member may turn off, and says why the others always come", () => {
    for (const name of names) {
      const { template, content } = render(name);
      if (template.alwaysSent === null) {
        expect(content.text, name).toContain(`${appUrl}/unsubscribe/u1.token.sig`);
        expect(content.html, name).toContain(`href="${appUrl}/unsubscribe/u1.token.sig"`);
      } else {
        expect(content.text, name).not.toContain("/unsubscribe/");
        expect(content.text, name).toContain("Guyline sends this message whatever your e-mail choices");
      }
    }
  });

  it("always sends account messages, cancellations and removed shifts (product brief: safety-critical changes always go out)", () => {
    const always = names.filter((name) => mailTemplates[name].alwaysSent !== null).sort();
    expect(always).toEqual(["antennaDayCancelled", "buildSessionCancelled", "invitation", "shiftRemoved", "signInHelp"]);
  });

  it("refuses to render an optional message without its unsubscribe link", () => {
    expect(() => renderTemplate(mailTemplates.shiftReminder, samples.shiftReminder, context(false))).toThrow(/unsubscribe link/);
  });

  it("writes times on the club's wall clock, naming the zone", () => {
    // Source: IANA Time Zone Database, Europe/London (BST = UTC+1 in June).
    const { content } = render("buildSessionConfirmed");
    expect(content.text).toContain("When:    Sat, 13 Jun 2026, 10:00–13:30 (Europe/London time)");
  });

  it("tells a waitlisted person their place in line and a promoted person that the place is theirs", () => {
    expect(render("buildSessionWaitlisted").content.text).toContain("You are number 2 in line");
    expect(render("buildSessionPromoted").content.text).toContain("the place is yours");
  });

  it("carries the safety cautions where people build or go to the field", () => {
    for (const name of ["buildSessionConfirmed", "buildSessionPromoted", "buildSessionReminder"] as const) {
      expect(render(name).content.text, name).toMatch(/RF voltage at the wire ends/);
    }
    for (const name of ["antennaDayPublished", "shiftReminder"] as const) {
      expect(render(name).content.text, name).toMatch(/Masts near power lines kill/);
    }
  });

  it("tells a waitlisted member until when an item is held for them", () => {
    // Source: IANA Time Zone Database, Europe/London (BST = UTC+1 in June): 12:30Z is 13:30.
    expect(render("waitlistOffer").content.text).toContain("The item is held for you until Sat, 13 Jun 2026, 13:30");
  });
});
