import { HELD_FUNCTIONS, LINE_FUNCTION_WORDS } from '../../../../shared/culinary/infer-dish';
import { LINE_FUNCTIONS, type LineFunction } from '../../../../shared/culinary/types';
import { SelectField } from '../../../components/ui/select-field';

const READING = 'reading';

export interface LineRolePickerProps {
  label: string;
  /** what Hearthswap read the line as doing */
  inferred: LineFunction;
  /** what the cook says instead, if anything */
  chosen?: LineFunction;
  onChoose: (role: LineFunction | null) => void;
}

/**
 * What a line does in the dish, in a cook's words, with the cook's say over it. Held functions
 * (salt, leaveners, aromatics…) keep the line as written in a rewrite; choosing another unlocks it.
 */
export function LineRolePicker({ label, inferred, chosen, onChoose }: LineRolePickerProps) {
  const role = chosen ?? inferred;
  const held = HELD_FUNCTIONS.has(role);
  return (
    <div className="flex flex-col gap-0.5 text-sm">
      <span className="flex items-center gap-2">
        <span className="text-ink-soft">Does:</span>
        <SelectField
          label={label}
          labelHidden
          value={chosen ?? READING}
          containerClassName="min-w-0 flex-1"
          className="py-1 text-sm"
          onChange={(e) => onChoose(e.target.value === READING ? null : (e.target.value as LineFunction))}
        >
          <option value={READING}>{LINE_FUNCTION_WORDS[inferred]} (as read)</option>
          {LINE_FUNCTIONS.filter((f) => f !== inferred).map((f) => (
            <option key={f} value={f}>
              {LINE_FUNCTION_WORDS[f]}
            </option>
          ))}
        </SelectField>
      </span>
      {held && <span className="font-semibold text-oat-700">Kept as written in a rewrite.</span>}
      {chosen && <span className="text-ink-soft">Your choice; the rewrite follows it.</span>}
    </div>
  );
}
