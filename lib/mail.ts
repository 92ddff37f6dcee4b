import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { enqueueMail } from "@/lib/jobs/queue";

let transporter: Transporter | undefined;

function getTransporter(): Transporter {
  if (!transporter) {
    const url = process.env.SMTP_URL;
    if (!url) throw new Error("SMTP_URL is not set");
    transporter = nodemailer.createTransport(url);
  }
  return transporter;
}

export const MAIL_FROM = process.env.MAIL_FROM ?? "Trainyard <noreply@trainyard.test>";

/** Queue a message: it is stored first and sent by the job worker, with retries (lib/jobs). */
export async function sendMail(message: { to: string; subject: string; text: string; html?: string }) {
  await enqueueMail(message);
}

/** Hand one message to the SMTP server now (the worker calls this; a failure is retried). */
export async function deliverMail(message: { to: string; subject: string; text: string; html?: string }) {
  await getTransporter().sendMail({ from: MAIL_FROM, ...message });
}

/** True when mail goes to the local fake, so the dev outbox may be shown. */
export function isMailFake(): boolean {
  return process.env.TRAINYARD_MAIL_FAKE === "1";
}

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

export function linkMail(opening: string, url: string, label: string, closing = ""): { text: string; html: string } {
  return {
    text: `${opening}\n\n${label}: ${url}\n\n${closing}`.trim(),
    html: `<p>${escapeHtml(opening)}</p><p><a href="${escapeHtml(url)}">${escapeHtml(label)}</a></p>${closing ? `<p>${escapeHtml(closing)}</p>` : ""}`,
  };
}
