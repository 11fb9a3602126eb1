'use client';

import { useState } from 'react';
import { THICKNESS_MATCH_TOLERANCE_MM, type ThicknessChoice } from '@/lib/cut-list/stock-match';
import { parseLength, type LengthUnit } from '@/lib/units/parse-length';

const OTHER = '__other';
const SAME = '__same';

/**
 * A stock thickness as the stock room has it: a list of the material's sheets and boards (nominal and actual), or
 * another thickness typed in any length form. The value is the length field's text, so the form reads it as usual.
 */
export function ThicknessPicker({
  id,
  label,
  value,
  onChange,
  onTyped,
  choices,
  unit,
  sameAs,
  error,
}: {
  id: string;
  label: string;
  value: string;
  onChange: (text: string) => void;
  /** A typed thickness, once the field is left: the form snaps it to the stock it means. */
  onTyped: (text: string) => void;
  choices: ThicknessChoice[];
  unit: LengthUnit;
  /** An optional field: the choice that leaves it empty ("Same as the front"). */
  sameAs?: string;
  error?: string;
}) {
  const parsed = value.trim() ? parseLength(value, { unit }) : null;
  const chosen = parsed?.ok ? choices.find((c) => Math.abs(c.thickness - parsed.mm) <= THICKNESS_MATCH_TOLERANCE_MM) : undefined;
  const [typing, setTyping] = useState(false);
  const selected = sameAs && !value.trim() && !typing ? SAME : chosen && !typing ? chosen.text : OTHER;
  const showInput = choices.length === 0 || selected === OTHER;

  return (
    <div>
      <label htmlFor={showInput && choices.length === 0 ? id : `${id}-choice`} className="field-label">
        {label}
      </label>
      {choices.length > 0 && (
        <select
          id={`${id}-choice`}
          className="field-input"
          value={selected}
          aria-invalid={error ? true : undefined}
          onChange={(e) => {
            const next = e.target.value;
            setTyping(next === OTHER);
            if (next === SAME) onChange('');
            else if (next !== OTHER) onChange(next);
          }}
        >
          {sameAs && <option value={SAME}>{sameAs}</option>}
          {choices.map((c) => (
            <option key={c.text} value={c.text}>
              {c.label}
            </option>
          ))}
          <option value={OTHER}>Another thickness…</option>
        </select>
      )}
      {showInput && (
        <input
          id={id}
          className={`field-input ${choices.length > 0 ? 'mt-1' : ''}`}
          aria-label={choices.length > 0 ? `${label}, typed` : undefined}
          placeholder={sameAs && choices.length === 0 ? sameAs.toLowerCase() : undefined}
          aria-invalid={error ? true : undefined}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          onBlur={(e) => {
            setTyping(false);
            onTyped(e.target.value);
          }}
        />
      )}
      {error && <p className="field-error">{error}</p>}
    </div>
  );
}
