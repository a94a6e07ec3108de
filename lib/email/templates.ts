/** Plain, printable e-mail bodies in the firm's name. Every template returns text and HTML. */

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

export interface MailBody {
  subject: string;
  text: string;
  html: string;
}

function layout(firmName: string, paragraphs: string[], action: { label: string; url: string }, footnote: string): string {
  const ps = paragraphs.map((p) => `<p style="margin:0 0 14px">${escapeHtml(p)}</p>`).join("");
  return `<!doctype html><html><body style="margin:0;background:#f7f4ee;font-family:Helvetica,Arial,sans-serif;color:#1f2328">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0"><tr><td align="center" style="padding:32px 16px">
<table role="presentation" width="560" cellpadding="0" cellspacing="0" style="background:#fffdf9;border:1px solid #e4ddd0;border-radius:8px">
<tr><td style="padding:24px 28px 8px;font-size:13px;letter-spacing:.08em;text-transform:uppercase;color:#9a4a1f">${escapeHtml(firmName)}</td></tr>
<tr><td style="padding:8px 28px 4px;font-size:15px;line-height:1.55">${ps}
<p style="margin:20px 0"><a href="${escapeHtml(action.url)}" style="background:#b2572a;color:#fff;text-decoration:none;padding:10px 18px;border-radius:6px;display:inline-block">${escapeHtml(action.label)}</a></p>
<p style="margin:0 0 18px;font-size:13px;color:#5b6168">If the button does not work, paste this address into your browser:<br>${escapeHtml(action.url)}</p></td></tr>
<tr><td style="padding:14px 28px 22px;border-top:1px solid #eee6d8;font-size:12px;color:#6b7075">${escapeHtml(footnote)}</td></tr>
</table></td></tr></table></body></html>`;
}

export function passwordResetMail(p: { firmName: string; name: string; url: string; validMinutes: number }): MailBody {
  const lines = [
    `Hello ${p.name},`,
    `Someone asked to reset the password of your Eigenroom account at ${p.firmName}. Choose a new password with the link below; it works once and expires in ${p.validMinutes} minutes.`,
  ];
  const foot = "If you did not ask for this, ignore this message: your password stays as it is.";
  return {
    subject: "Reset your Eigenroom password",
    text: `${lines.join("\n\n")}\n\n${p.url}\n\n${foot}\n`,
    html: layout(p.firmName, lines, { label: "Choose a new password", url: p.url }, foot),
  };
}

export function invitationMail(p: { firmName: string; inviterName: string; name: string; roleLabel: string; url: string; validDays: number }): MailBody {
  const lines = [
    `Hello ${p.name},`,
    `${p.inviterName} has invited you to ${p.firmName} on Eigenroom as ${p.roleLabel.toLowerCase()}. Set your password with the link below to start; it expires in ${p.validDays} days.`,
  ];
  const foot = `You received this because ${p.inviterName} entered your address. If you were not expecting it, you can ignore it.`;
  return {
    subject: `${p.firmName} invites you to Eigenroom`,
    text: `${lines.join("\n\n")}\n\n${p.url}\n\n${foot}\n`,
    html: layout(p.firmName, lines, { label: "Accept the invitation", url: p.url }, foot),
  };
}

export function reportIssuedMail(p: {
  firmName: string;
  engineerName: string;
  clientName: string;
  projectName: string;
  roomName: string;
  reportNumber: string;
  revision: number;
  summary: string;
  url: string;
  attached: boolean;
  firstRevision: boolean;
}): MailBody {
  const what = `${p.reportNumber}, revision ${p.revision}`;
  const lines = [
    `Hello ${p.clientName},`,
    p.firstRevision
      ? `${p.engineerName} has finished the recommendation report for ${p.roomName} (${p.projectName}): ${what}.`
      : `${p.engineerName} has issued a new revision of the recommendation report for ${p.roomName} (${p.projectName}): ${what}. It replaces the earlier revision.`,
    p.summary,
    p.attached
      ? "The signed PDF is attached. You can also read and download it, approve the recommendation or ask a question on your project page:"
      : "Read and download the signed PDF, approve the recommendation or ask a question on your project page:",
  ];
  const foot = `The PDF is digitally signed by ${p.firmName}. To check that a copy is genuine, open ${new URL("/verify", p.url).href} and upload it.`;
  return {
    subject: `${p.firmName}: your room report ${what}`,
    text: `${lines.join("\n\n")}\n\n${p.url}\n\n${foot}\n`,
    html: layout(p.firmName, lines, { label: "Open the report", url: p.url }, foot),
  };
}

export function reportCommentMail(p: { firmName: string; toName: string; fromName: string; kind: "question" | "answer"; reportNumber: string; roomName: string; body: string; url: string }): MailBody {
  const lines = [
    `Hello ${p.toName},`,
    p.kind === "question" ? `${p.fromName} asked a question about report ${p.reportNumber} (${p.roomName}):` : `${p.fromName} answered on report ${p.reportNumber} (${p.roomName}):`,
    p.body,
  ];
  const foot = "Reply on the report page so that the whole thread stays with the report.";
  return {
    subject: `${p.kind === "question" ? "Question" : "Answer"} on ${p.reportNumber} (${p.roomName})`,
    text: `${lines.join("\n\n")}\n\n${p.url}\n\n${foot}\n`,
    html: layout(p.firmName, lines, { label: "Open the thread", url: p.url }, foot),
  };
}
