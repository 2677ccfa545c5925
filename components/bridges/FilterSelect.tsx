/** One choice of a select: the value sent in the query string and the words shown. */
export type FilterOption = { value: string; label: string };

/**
 * One labelled select of the portfolio's filter form (a plain GET form field named `name`), with an
 * optional first choice that sends nothing (empty value) and so leaves the filter off.
 */
export default function FilterSelect({ name, label, options, value, anyLabel }: { name: string; label: string; options: FilterOption[]; value: string; anyLabel?: string }) {
  const id = `portfolio-${name}`;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select id={id} name={name} defaultValue={value} className="field-input mt-1 py-1.5">
        {anyLabel !== undefined ? <option value="">{anyLabel}</option> : null}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}
