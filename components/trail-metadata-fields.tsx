import { DIFFICULTIES, DIRECTION_LABELS, TRAIL_KINDS } from "@/lib/trails/pure/vocabulary";
import { difficultyValues, trailDirectionValues, trailKindValues } from "@/lib/trails/pure/schemas";

export type MetadataValues = { name: string; difficulty: string; kind: string; direction: string };

/** Name, difficulty, kind and direction inputs shared by the upload and edit pages (controlled). */
export function TrailMetadataFields({ values, onChange, errors = {}, idPrefix }: {
  values: MetadataValues;
  onChange: (values: MetadataValues) => void;
  errors?: Record<string, string | undefined>;
  idPrefix: string;
}) {
  const field = (name: keyof MetadataValues) => ({
    id: `${idPrefix}-${name}`,
    name,
    value: values[name],
    onChange: (e: React.ChangeEvent<HTMLInputElement | HTMLSelectElement>) => onChange({ ...values, [name]: e.target.value }),
    "aria-invalid": Boolean(errors[name]),
    "aria-describedby": `${idPrefix}-${name}-error`,
    className: "field",
  });
  const error = (name: keyof MetadataValues) => (
    <p id={`${idPrefix}-${name}-error`} className="field-error" aria-live="polite">{errors[name] ?? ""}</p>
  );
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <label htmlFor={`${idPrefix}-name`} className="label">Trail name</label>
        <input {...field("name")} maxLength={80} required />
        {error("name")}
      </div>
      <div>
        <label htmlFor={`${idPrefix}-difficulty`} className="label">Difficulty</label>
        <select {...field("difficulty")}>
          {difficultyValues.map((d) => (
            <option key={d} value={d}>{`${DIFFICULTIES[d].label} (${DIFFICULTIES[d].signName})`}</option>
          ))}
        </select>
        {error("difficulty")}
      </div>
      <div>
        <label htmlFor={`${idPrefix}-kind`} className="label">Kind</label>
        <select {...field("kind")}>
          {trailKindValues.map((k) => <option key={k} value={k}>{TRAIL_KINDS[k].label}</option>)}
        </select>
        {error("kind")}
      </div>
      <div>
        <label htmlFor={`${idPrefix}-direction`} className="label">Direction</label>
        <select {...field("direction")}>
          {trailDirectionValues.map((d) => <option key={d} value={d}>{DIRECTION_LABELS[d]}</option>)}
        </select>
        {error("direction")}
      </div>
    </div>
  );
}
