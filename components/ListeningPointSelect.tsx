// The listening point to hear or show, as a labelled choice; nothing when the show has only one.
export function ListeningPointSelect({ points, value, onChange }: { points: readonly { id: string; name: string }[]; value: string | null; onChange: (id: string) => void }) {
  if (points.length < 2) return null;
  return (
    <label>
      Listening point{" "}
      <select className="min-h-9 rounded-md border border-ink/20 bg-paper-raised px-2" value={value ?? ""} onChange={(e) => onChange(e.target.value)}>
        {points.map((l) => (
          <option key={l.id} value={l.id}>
            {l.name}
          </option>
        ))}
      </select>
    </label>
  );
}
