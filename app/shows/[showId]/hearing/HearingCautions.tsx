// What the hearing figures are and are not, and who decides: shown beside every hearing map.
import type { HearingResponse } from "./hearing-types";

export function HearingCautions({ criteria, anyOver }: { criteria: HearingResponse["criteria"]; anyOver: boolean }) {
  return (
    <aside aria-labelledby="cautions-title" className="rounded-xl border-2 border-signal-warn/50 bg-paper-raised px-5 py-4">
      <h2 id="cautions-title" className="text-lg font-semibold text-ink">Hearing cautions</h2>
      <ul className="mt-2 list-disc space-y-1.5 pl-5 text-ink">
        <li>
          These are <strong>estimates</strong> from the acoustic model, not measurements. The player&apos;s own instrument is not counted and adds to what they hear; the whole rehearsal is taken at this set&apos;s level.
        </li>
        <li>
          {anyOver ? <strong>Some players pass the daily limit in this rehearsal. </strong> : null}
          Where the dose passes 100 %, we recommend <strong>musicians&apos; hearing protection</strong> (flat-attenuation earplugs) for those players, and shorter loud run-throughs.
        </li>
        <li>
          Follow your <strong>school&apos;s or venue&apos;s rules</strong>. Any decision about a person&apos;s hearing belongs to a <strong>licensed audiologist</strong>.
        </li>
      </ul>
      <dl className="mt-3 grid gap-2 text-sm sm:grid-cols-2">
        <div className="rounded-lg bg-paper px-3 py-2">
          <dt className="font-semibold">NIOSH recommended limit</dt>
          <dd>
            {criteria.niosh.levelDbA} dBA for {criteria.niosh.hours} h, {criteria.niosh.exchangeDb} dB exchange rate (each +3 dB halves the time). {criteria.niosh.source}.
          </dd>
        </div>
        <div className="rounded-lg bg-paper px-3 py-2">
          <dt className="font-semibold">OSHA permissible limit, for comparison</dt>
          <dd>
            {criteria.osha.levelDbA} dBA for {criteria.osha.hours} h, {criteria.osha.exchangeDb} dB exchange rate. {criteria.osha.source}.
          </dd>
        </div>
      </dl>
    </aside>
  );
}
