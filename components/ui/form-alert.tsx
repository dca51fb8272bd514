/** A form-level message (not tied to one field), announced to screen readers. */
export function FormAlert({ message }: { message: string | null | undefined }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-lg bg-red-50 p-3 text-sm font-medium text-red-800">
      {message}
    </p>
  );
}
