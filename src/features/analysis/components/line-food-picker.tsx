import type { Ref } from 'react';
import type { FoodSummary } from '../../../../shared/schemas/analyze';
import { SelectField } from '../../../components/ui/select-field';

const SEARCH = 'search';
const AUTO = 'auto';
const NONE = 'none';

export interface LineFoodPickerProps {
  label: string;
  /** the food the line is matched to (or pinned to) now */
  food: FoodSummary | null;
  /** the next best matches the server offered, and foods the cook picked before */
  options: FoodSummary[];
  pinned: boolean;
  disabled?: boolean;
  onChoose: (food: FoodSummary | null) => void;
  /** open a catalogue search for this line */
  onSearch?: () => void;
  ref?: Ref<HTMLSelectElement>;
}

/** Which catalogue food a line is: the match, the alternatives, a search, or back to the automatic match. */
export function LineFoodPicker({ label, food, options, pinned, disabled, onChoose, onSearch, ref }: LineFoodPickerProps) {
  const choices = [...(food ? [food] : []), ...options.filter((o) => o.id !== food?.id)].filter((o, i, all) => all.findIndex((x) => x.id === o.id) === i);
  return (
    <SelectField
      ref={ref}
      label={label}
      labelHidden
      value={food ? String(food.id) : NONE}
      disabled={disabled}
      className="py-2 text-sm sm:text-base"
      onChange={(e) => {
        const value = e.target.value;
        if (value === SEARCH) onSearch?.();
        else if (value === AUTO) onChoose(null);
        else {
          const chosen = choices.find((c) => String(c.id) === value);
          if (chosen && chosen.id !== food?.id) onChoose(chosen);
        }
      }}
    >
      {!food && (
        <option value={NONE} disabled>
          No match: choose a food
        </option>
      )}
      {choices.length > 0 && (
        <optgroup label={food ? 'Matched food and others like it' : 'Close matches'}>
          {choices.map((c) => (
            <option key={c.id} value={String(c.id)}>
              {c.name}
            </option>
          ))}
        </optgroup>
      )}
      <optgroup label="More">
        {onSearch && <option value={SEARCH}>Search the catalogue…</option>}
        {pinned && <option value={AUTO}>Let Hearthswap match it again</option>}
      </optgroup>
    </SelectField>
  );
}
