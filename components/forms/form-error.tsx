/** The server's reason a form was not saved, announced when it appears. */
export function FormError({ message }: { message: string | null | undefined }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-control border-2 border-danger-600 bg-danger-100 p-3 font-medium text-danger-700">
      {message}
    </p>
  );
}
