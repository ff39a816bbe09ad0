"use client";

import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { unsubscribeAction } from "./actions";

export function UnsubscribeButton({ token, topic, subscribed }: { token: string; topic: string; subscribed: boolean }) {
  const [isSubscribed, setSubscribed] = useState(subscribed);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  const toggle = (subscribe: boolean) =>
    startTransition(async () => {
      const result = await unsubscribeAction({ token, subscribe });
      if (result.ok) setSubscribed(subscribe);
      else setError(result.message ?? Object.values(result.fieldErrors ?? {})[0] ?? "That did not work.");
    });
  return (
    <div>
      {error && <Notice tone="danger">{error}</Notice>}
      <p className="mb-3 font-bold" role="status">
        {isSubscribed ? `You get e-mails about ${topic}.` : `You no longer get e-mails about ${topic}.`}
      </p>
      {isSubscribed ? (
        <Button className="w-full" disabled={pending} onClick={() => toggle(false)}>
          Stop e-mails about {topic}
        </Button>
      ) : (
        <Button variant="secondary" className="w-full" disabled={pending} onClick={() => toggle(true)}>
          Start them again
        </Button>
      )}
    </div>
  );
}
