import { useSignOut } from '../api/queries';

export function SignOutButton({ onSignedOut }: { onSignedOut: () => void }) {
  const signOut = useSignOut();
  return (
    <button
      type="button"
      onClick={() => signOut.mutate(undefined, { onSettled: onSignedOut })}
      disabled={signOut.isPending}
      className="w-full rounded-md border border-tide-600 px-3 py-1.5 text-xs font-medium text-tide-100 hover:bg-tide-700 disabled:opacity-60"
    >
      Sign out
    </button>
  );
}
