import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AdminOnlyNotice, getAdminOrNull } from "@/components/admin/admin-only";
import { MessageText } from "@/components/admin/message-text";
import { findOutboxMessage } from "@/db/queries/outbox";
import { positiveIntParam } from "@/lib/api/params";

export const metadata: Metadata = { title: "Message" };

export default async function OutboxMessagePage(props: { params: Promise<{ messageId: string }> }) {
  const [params, admin] = await Promise.all([props.params, getAdminOrNull()]);
  if (!admin) return <AdminOnlyNotice />;
  const id = positiveIntParam.safeParse(params.messageId);
  if (!id.success) notFound();
  const message = await findOutboxMessage({ id: id.data });
  if (!message) notFound();

  return (
    <div className="max-w-4xl space-y-4">
      <Link href="/admin/outbox" className="text-sm text-tide hover:underline">
        ← Outbox
      </Link>
      <h1 className="text-2xl font-bold">{message.subject || "(no subject)"}</h1>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="font-semibold">From</dt>
        <dd>{message.from}</dd>
        <dt className="font-semibold">To</dt>
        <dd data-testid="message-to">{message.to}</dd>
        <dt className="font-semibold">Received</dt>
        <dd>{message.receivedAt.toISOString().replace("T", " ").slice(0, 19)} UTC</dd>
      </dl>
      <MessageText text={message.text} />
      <details className="text-sm">
        <summary className="cursor-pointer text-tide">Raw message (as received over SMTP)</summary>
        <pre className="mt-2 overflow-x-auto rounded-card border border-line bg-surface p-4 text-xs">{message.raw}</pre>
      </details>
    </div>
  );
}
