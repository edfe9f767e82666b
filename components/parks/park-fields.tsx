import { TIME_ZONES, type ParkFormValues } from "@/lib/parks/pure/schemas";

type Errors = Record<string, string | undefined>;

/** The API's field names for each input ("location.lon" for the longitude box), so a refusal lands beside its input. */
const API_FIELD: Partial<Record<keyof ParkFormValues, string>> = { lon: "location.lon", lat: "location.lat" };
export const errorFor = (errors: Errors, name: keyof ParkFormValues) => errors[API_FIELD[name] ?? name] ?? (name === "lon" || name === "lat" ? errors.location : undefined);

/** Name, address, time zone, location, elevations and contact: shared by the create and settings forms (controlled). */
export function ParkFields({ values, onChange, errors, idPrefix, slugLocked, slugHint }: {
  values: ParkFormValues;
  onChange: (values: ParkFormValues) => void;
  errors: Errors;
  idPrefix: string;
  slugLocked?: boolean;
  slugHint?: string;
}) {
  const input = (name: keyof ParkFormValues, extra: React.InputHTMLAttributes<HTMLInputElement> = {}) => {
    const error = errorFor(errors, name);
    return (
      <input
        id={`${idPrefix}-${name}`}
        name={name}
        value={values[name]}
        onChange={(e) => onChange({ ...values, [name]: e.target.value })}
        aria-invalid={Boolean(error)}
        aria-describedby={`${idPrefix}-${name}-error`}
        className="field"
        {...extra}
      />
    );
  };
  const label = (name: keyof ParkFormValues, text: string) => <label htmlFor={`${idPrefix}-${name}`} className="label">{text}</label>;
  const error = (name: keyof ParkFormValues) => <p id={`${idPrefix}-${name}-error`} className="field-error" aria-live="polite">{errorFor(errors, name) ?? ""}</p>;
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <div className="sm:col-span-2">{label("name", "Park name")}{input("name", { maxLength: 100, required: true })}{error("name")}</div>
      <div className="sm:col-span-2">
        {label("slug", "Web address (slug)")}
        {input("slug", { maxLength: 60, required: true, readOnly: slugLocked, pattern: "[a-z0-9-]{3,60}", autoCapitalize: "none", spellCheck: false })}
        <p className="mt-1 text-sm text-loam-600">{slugHint ?? `Riders will find the park at /parks/${values.slug || "…"}`}</p>
        {error("slug")}
      </div>
      <div className="sm:col-span-2">
        {label("timeZone", "Time zone")}
        {input("timeZone", { list: `${idPrefix}-zones`, required: true, autoCapitalize: "none", spellCheck: false, placeholder: "Europe/Zurich" })}
        <datalist id={`${idPrefix}-zones`}>
          {TIME_ZONES.map((zone) => <option key={zone} value={zone} />)}
        </datalist>
        {error("timeZone")}
      </div>
      <div>{label("lat", "Latitude (°)")}{input("lat", { inputMode: "decimal", required: true, placeholder: "46.80" })}{error("lat")}</div>
      <div>{label("lon", "Longitude (°)")}{input("lon", { inputMode: "decimal", required: true, placeholder: "8.50" })}{error("lon")}</div>
      <div>{label("baseElevationM", "Base elevation (m)")}{input("baseElevationM", { inputMode: "numeric", required: true })}{error("baseElevationM")}</div>
      <div>{label("summitElevationM", "Summit elevation (m)")}{input("summitElevationM", { inputMode: "numeric", required: true })}{error("summitElevationM")}</div>
      <div>{label("contactEmail", "Contact e-mail (optional)")}{input("contactEmail", { type: "email", autoComplete: "off" })}{error("contactEmail")}</div>
      <div>{label("websiteUrl", "Website (optional)")}{input("websiteUrl", { type: "url", placeholder: "https://" })}{error("websiteUrl")}</div>
    </div>
  );
}

/** The form's message line: a success or a refusal, announced. */
export function FormNote({ note }: { note: { ok: boolean; text: string } | null }) {
  if (!note) return <p aria-live="polite" className="sr-only" />;
  return <p role={note.ok ? "status" : "alert"} className={`rounded-lg p-3 font-semibold ${note.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`}>{note.text}</p>;
}
