import { useId } from 'react';

/** A keyboard-operable slider (native range input) choosing one block length n, with its value shown beside it. */
export function LengthSlider({
  label,
  value,
  range,
  onChange,
  testId,
}: {
  readonly label: string;
  readonly value: number;
  readonly range: readonly [number, number];
  readonly onChange: (n: number) => void;
  readonly testId: string;
}) {
  const id = useId();
  const single = range[0] === range[1];
  return (
    <div className="length-slider">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="range"
        min={range[0]}
        max={range[1]}
        step={1}
        value={value}
        disabled={single}
        aria-valuetext={`n = ${value}`}
        data-testid={testId}
        onChange={(event) => onChange(Number(event.currentTarget.value))}
      />
      <output htmlFor={id} aria-hidden="true">
        n = {value}
      </output>
    </div>
  );
}
