import type { Metadata } from "next";
import Link from "next/link";
import { AdminOnlyNotice, getAdminOrNull } from "@/components/admin/admin-only";
import { listOutboxMessages, OUTBOX_PAGE_SIZE } from "@/db/queries/outbox";
import { getEnv } from "@/lib/env";

export const metadata: Metadata = { title: "Outbox" };

function formatTime(at: Date): string {
  return `${at.toISOString().replace("T", " ").slice(0, 19)} UTC`;
}

export default async function OutboxPage() {
  const admin = await getAdminOrNull();
  if (!admin) return <AdminOnlyNotice />;
  const messages = await listOutboxMessages();
  const env = getEnv();

  return (
    <div className="space-y-4">
      <div className="space-y-1">
        <h1 className="text-2xl font-bold">Outbox</h1>
        <p className="max-w-3xl text-ink-muted">
          Every message Leeway&apos;s local SMTP server received, newest first (the latest {OUTBOX_PAGE_SIZE}). Mail sent to{" "}
          {env.SMTP_HOST}:{env.SMTP_PORT} stays on this machine; a deployment that points SMTP_HOST at a real mail service
          delivers instead, and this page then only shows what was kept here before.
        </p>
      </div>
      {messages.length === 0 ? (
        <p className="text-ink-muted">No messages yet.</p>
      ) : (
        <table className="w-full border-collapse text-left text-sm" data-testid="outbox-table">
          <thead className="border-b border-line-strong">
            <tr>
              <th scope="col" className="py-2 pr-4 font-semibold">Received</th>
              <th scope="col" className="py-2 pr-4 font-semibold">To</th>
              <th scope="col" className="py-2 font-semibold">Subject</th>
            </tr>
          </thead>
          <tbody>
            {messages.map((message) => (
              <tr key={message.id} className="border-b border-line">
                <td className="py-2 pr-4 whitespace-nowrap">{formatTime(message.receivedAt)}</td>
                <td className="py-2 pr-4">{message.to}</td>
                <td className="py-2">
                  <Link href={`/admin/outbox/${message.id}`} className="text-tide hover:underline">
                    {message.subject || "(no subject)"}
                  </Link>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
