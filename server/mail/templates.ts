import type { MailMessage } from "./mailer";

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] ?? c);
}

function page(paragraphs: string[], link: { url: string; label: string }): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join("\n");
  const button = `<p><a href="${escapeHtml(link.url)}">${escapeHtml(link.label)}</a></p>`;
  return `<!doctype html><html><body style="font-family:sans-serif">${body}\n${button}</body></html>`;
}

/** The password-reset e-mail: a link valid for one hour. */
export function resetPasswordMail(to: { email: string; name: string }, url: string): MailMessage {
  const lines = [
    `Hello ${to.name},`,
    "Someone asked to reset the password of your Equilibrist account. Open the link below within one hour to choose a new password.",
    "If it was not you, ignore this e-mail: your password stays as it is.",
  ];
  return {
    to: to.email,
    subject: "Reset your Equilibrist password",
    text: `${lines[0]}\n\n${lines[1]}\n\n${url}\n\n${lines[2]}\n`,
    html: page(lines, { url, label: "Choose a new password" }),
  };
}

/** The invitation e-mail: group, role and who invited, with the acceptance link. */
export function groupInviteMail(
  invite: { email: string; groupName: string; role: string; inviterName: string },
  url: string,
): MailMessage {
  const lines = [
    `${invite.inviterName} invited you to the group "${invite.groupName}" on Equilibrist as ${invite.role}.`,
    "Open the link below to accept. Sign in (or create an account) with this e-mail address first.",
  ];
  return {
    to: invite.email,
    subject: `Invitation to ${invite.groupName} on Equilibrist`,
    text: `${lines[0]}\n\n${lines[1]}\n\n${url}\n`,
    html: page(lines, { url, label: "Open the invitation" }),
  };
}

/** Facts of a finished map for its owner's e-mail. */
export interface FinishedMapFacts {
  title: string;
  status: string;
  cellsTotal: number;
  cellsComputed: number;
  cellsFromCache: number;
  /** Seconds from the first finished cell to the last (null when unknown). */
  seconds: number | null;
  failure: string | null;
}

function duration(seconds: number | null): string {
  if (seconds === null) return "";
  if (seconds < 90) return ` in ${Math.max(1, Math.round(seconds))} s`;
  if (seconds < 5400) return ` in ${Math.round(seconds / 60)} min`;
  return ` in ${(seconds / 3600).toFixed(1)} h`;
}

/** The "map finished" e-mail (sent only to owners who opted in on their account page). */
export function mapFinishedMail(to: { email: string; name: string }, map: FinishedMapFacts, url: string): MailMessage {
  const done = map.status === "done";
  const counts = `${map.cellsTotal} cells (${map.cellsComputed} computed, ${map.cellsFromCache} from the cache)`;
  const lines = [
    `Hello ${to.name},`,
    done
      ? `Your map "${map.title}" has finished filling: ${counts}${duration(map.seconds)}.`
      : `Your map "${map.title}" stopped (${map.status})${map.failure ? `: ${map.failure}` : ""}. Finished cells are kept.`,
    "Open the link below to see it. You get this e-mail because \"E-mail me when a map finishes\" is on in your account settings.",
  ];
  return {
    to: to.email,
    subject: done ? `Map finished: ${map.title}` : `Map ${map.status}: ${map.title}`,
    text: `${lines.join("\n\n")}\n\n${url}\n`,
    html: page(lines, { url, label: "Open the map" }),
  };
}
