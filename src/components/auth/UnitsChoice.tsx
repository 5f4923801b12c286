/** Inches or centimetres, as a radio group (the preference for every measurement Threadway shows). */
export function UnitsChoice({ value, error }: { value: 'in' | 'cm'; error?: string | undefined }) {
  return (
    <fieldset className="flex flex-col gap-1" aria-describedby={error ? 'units-error' : undefined}>
      <legend className="font-semibold">Measure in</legend>
      <div className="flex flex-wrap gap-4">
        <label className="inline-flex items-center gap-2">
          <input type="radio" name="units" value="in" defaultChecked={value === 'in'} className="h-4 w-4 accent-denim-600" /> Inches
        </label>
        <label className="inline-flex items-center gap-2">
          <input type="radio" name="units" value="cm" defaultChecked={value === 'cm'} className="h-4 w-4 accent-denim-600" /> Centimetres
        </label>
      </div>
      {error && (
        <p id="units-error" className="text-sm font-semibold text-madder-600">
          {error}
        </p>
      )}
    </fieldset>
  );
}
