/** An error under a group of inputs (a fieldset, a row), in the same look as TextField's own. */
export function FieldError({ id, message }: { id?: string; message: string }) {
  return (
    <p id={id} className="flex items-start gap-1 font-semibold text-rust-700">
      <span aria-hidden="true">⚠</span>
      {message}
    </p>
  );
}
