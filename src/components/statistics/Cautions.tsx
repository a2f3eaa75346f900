/** The cautions every figure that can feed a design decision carries. */
export default function Cautions({ cautions }: { cautions: readonly string[] }) {
  return (
    <aside
      className="rounded border border-caution-300 bg-caution-50 p-3 text-xs text-caution-900"
      data-testid="cautions"
      aria-label="Cautions"
    >
      <p className="font-semibold">Read these figures with care</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-4">
        {cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
    </aside>
  );
}
