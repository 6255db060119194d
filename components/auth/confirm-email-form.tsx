'use client';

import { useRouter } from 'next/navigation';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { useConfirmSignUp } from '@/lib/queries/accounts';

/** A button, not a page load, confirms: mail scanners that open links must not use the token. */
export function ConfirmEmailForm({ token }: { token: string }) {
  const router = useRouter();
  const confirm = useConfirmSignUp();
  return (
    <div className="space-y-4">
      <FormMessage message={confirm.error?.message} />
      <Button
        className="w-full"
        disabled={confirm.isPending}
        onClick={() =>
          confirm.mutate(token, {
            onSuccess: ({ confirmed }) => router.push(`/sign-in?confirmed=${encodeURIComponent(confirmed.email)}`),
          })
        }
      >
        {confirm.isPending ? 'Confirming…' : 'Confirm my address'}
      </Button>
    </div>
  );
}
