import Link from "next/link";

export default function MessageNotFound() {
  return (
    <div className="space-y-2">
      <h1 className="text-2xl font-bold">No such message</h1>
      <p>
        The outbox has no message with this number. <Link href="/admin/outbox" className="text-tide underline">Back to the outbox</Link>
      </p>
    </div>
  );
}
