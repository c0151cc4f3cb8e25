/** A form's own message (the server's `error.message`), announced when it appears. */
export function FormError({ id, message, className = "min-h-6 font-bold text-flag" }: { id?: string; message: string | null | undefined; className?: string }) {
  return (
    <p id={id} role="alert" aria-live="polite" className={className}>
      {message ?? ""}
    </p>
  );
}
