/** The message above a form when the server refused it for a reason not tied to one field. */
export function FormAlert({ message }: { message: string | null | undefined }) {
  if (!message) return null;
  return (
    <div role="alert" className="rounded-md border border-ember-100 bg-ember-50 px-3 py-2 text-sm text-ember-700">
      {message}
    </div>
  );
}
