/** An error under a field or group, in the same look as the shared TextField's. */
export function FieldErrorText({ id, message }: { id?: string; message: string }) {
  return (
    <p id={id} className="flex items-start gap-1 font-semibold text-rust-700">
      <span aria-hidden="true">⚠</span>
      {message}
    </p>
  );
}
