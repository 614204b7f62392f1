/** What still keeps a section or vent from counting, minus what its fields already say in place. */
export function RemainingProblems({ problems, fieldErrors }: { problems: string[]; fieldErrors: string[] }) {
  const rest = problems.filter((p) => !fieldErrors.some((e) => p.endsWith(e)));
  if (rest.length === 0) return null;
  return (
    <ul className="space-y-1 text-sm text-warning-800">
      {rest.map((p) => (
        <li key={p}>• {p}</li>
      ))}
    </ul>
  );
}
