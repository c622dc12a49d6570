// The show's weather, ground and field rules, with what they mean for the prediction.
import type { Conditions, FieldRules } from "@/components/api-types";
import { FIELD_RULES_WORDS } from "@/lib/field/rules-words";
import { groundWords } from "./show-words";

function Row({ term, value, note }: { term: string; value: string; note?: string }) {
  return (
    <div className="grid grid-cols-[minmax(8rem,1fr)_2fr] gap-3 border-b border-ink/10 py-3 last:border-0">
      <dt className="font-semibold text-ink-soft">{term}</dt>
      <dd>
        <span className="font-semibold tabular-nums text-ink">{value}</span>
        {note ? <span className="block text-sm text-ink-soft">{note}</span> : null}
      </dd>
    </div>
  );
}

export function ConditionsList({ conditions, fieldRules }: { conditions: Conditions; fieldRules: FieldRules }) {
  const ground = groundWords(conditions.groundFactor);
  const between = groundWords(conditions.betweenGroundFactor ?? null);
  const rules = FIELD_RULES_WORDS[fieldRules];
  return (
    <dl>
      <Row term="Temperature" value={`${conditions.temperatureC} °C`} note="Sets the speed of sound and the air's absorption." />
      <Row term="Humidity" value={`${conditions.relativeHumidityPct} %`} note="Dry air absorbs high frequencies more." />
      <Row term="Air pressure" value={`${conditions.pressureKPa} kPa`} />
      <Row
        term="Field surface"
        value={conditions.groundFactor === null ? ground.name : `${ground.name} (G = ${conditions.groundFactor})`}
        note={ground.meaning}
      />
      {conditions.groundFactor !== null && conditions.betweenGroundFactor != null ? (
        <Row
          term="Between field and stands"
          value={`${between.name} (G = ${conditions.betweenGroundFactor})`}
          note={`${between.meaning} ISO 9613-2 7.3.1 gives the source, middle and receiver regions of each path their own ground.`}
        />
      ) : null}
      <Row term="Field rules" value={rules.name} note={rules.hashes} />
    </dl>
  );
}
