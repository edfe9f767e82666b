"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/form-bits";
import { retryFailedAction } from "@/lib/notices/notice-actions";
import { initialFormState } from "@/lib/shared/form-state";

export function RetryFailedForm({ parkSlug, noticeId, failed }: { parkSlug: string; noticeId: string; failed: number }) {
  const [state, action, pending] = useActionState(retryFailedAction, initialFormState);
  return (
    <form action={action} className="space-y-2">
      <input type="hidden" name="parkSlug" value={parkSlug} />
      <input type="hidden" name="noticeId" value={noticeId} />
      <FormMessage state={state} />
      <button type="submit" className="btn-primary" disabled={pending || failed === 0}>
        {pending ? "Queueing…" : `Retry ${failed} failed`}
      </button>
    </form>
  );
}
