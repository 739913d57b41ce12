/** A problem with what was just tried, said in words and announced to screen readers; nothing when there is none. */
export function FormProblem({ message, id }: { message: string | null | undefined | false; id?: string }) {
  if (!message) return null;
  return (
    <p className="pl-form-problem" role="alert" id={id}>
      {message}
    </p>
  );
}
