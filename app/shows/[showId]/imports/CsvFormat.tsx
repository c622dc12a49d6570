// The CSV files the imports page reads, described where people bring them in.

const ROSTER: [string, string][] = [
  ["label", "The dot's label, 1–16 letters or digits, unique in the file: T4"],
  ["instrument", "The instrument as people name it (Alto saxophone, Trumpet) or as the catalog lists it"],
  ["section", "The section the music gives voices to: Trumpets"],
  ["part", "Optional: 1st, sousaphone"],
  ["strength", "Optional, dB from −6 (a weak player) to +6 (a strong one); empty is 0"],
  ["name", "Optional: the player's name"],
];

const DRILL: [string, string][] = [
  ["set, counts, label", "The set number (12, 12A), its counts from the set before (0 for the opening set, the same on every row of a set), the performer's label from the roster"],
  ["position", "Where they stand, in the words the coordinate sheets print: side 1: 2 steps outside the 35 yard line; 4 steps in front of the front hash"],
  ["facing", "front, back, side 1, side 2, or degrees (0 toward the front sideline, 90 toward side 2); empty faces the front"],
];

function Columns({ caption, rows }: { caption: string; rows: [string, string][] }) {
  return (
    <table className="mt-2 w-full text-left text-sm">
      <caption className="text-left font-semibold text-ink">{caption}</caption>
      <thead>
        <tr className="border-b border-ink/20 text-ink-soft">
          <th scope="col" className="py-1 pr-3">Column</th>
          <th scope="col" className="py-1">What it holds</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([column, meaning]) => (
          <tr key={column} className="border-b border-ink/10 align-top">
            <td className="py-1 pr-3 font-mono">{column}</td>
            <td className="py-1">{meaning}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function CsvFormat() {
  return (
    <details className="mt-4 rounded-md border border-ink/10 p-3">
      <summary className="cursor-pointer font-semibold text-ink">What the CSV files hold</summary>
      <p className="mt-2 text-sm text-ink-soft">
        UTF-8, comma-separated, the first row the header. Column names are not case-sensitive; spaces count as underscores. A roster row per performer, matched by label; a drill row per performer per set, matched by set number
        and label. Performers a drill file leaves out of a set keep their place.
      </p>
      <Columns caption="Roster" rows={ROSTER} />
      <Columns caption="Drill" rows={DRILL} />
      <p className="mt-2 text-sm text-ink-soft">
        Instead of one position column, a drill row may give side (1 or 2, empty on the 50), yard_line (0 to 50 in fives), steps_side and in_out (inside or outside), reference (front sideline, front hash, back hash or back
        sideline), steps_fb and front_back (in front or behind). A step is 8 to 5 (22.5 in).
      </p>
    </details>
  );
}
