"use client";

import { Button } from "@/components/ui/button";

export default function WorkspaceError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="space-y-3">
      <h1 className="text-2xl font-bold">This page could not be shown</h1>
      <p>{error.message || "Something went wrong on the server; nothing was changed."}</p>
      <Button variant="secondary" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
