import { NumberStepper } from '../../../components/ui/number-stepper';
import { Spinner } from '../../../components/ui/spinner';
import { MAX_PORTIONS, MIN_PORTIONS } from '../prep-words';

export interface PortionsControlProps {
  portions: number;
  onChange: (portions: number) => void;
  /** servings the version was written for; one portion is one of them */
  servings: number | null;
  /** the server's word on the portions asked for (a 400 naming portions) */
  error?: string;
  /** a new batch size is being worked out */
  busy?: boolean;
}

/** How many portions to prep, 1 to 100; the address keeps the number. */
export function PortionsControl({ portions, onChange, servings, error, busy = false }: PortionsControlProps) {
  const hint =
    servings !== null
      ? `One portion is one serving of this version, which is written for ${servings}. From ${MIN_PORTIONS} to ${MAX_PORTIONS}.`
      : `From ${MIN_PORTIONS} to ${MAX_PORTIONS}.`;
  return (
    <div className="flex flex-wrap items-end gap-x-4 gap-y-2">
      <NumberStepper
        label="Portions to prep"
        value={portions}
        min={MIN_PORTIONS}
        max={MAX_PORTIONS}
        onChange={onChange}
        unit="portions"
        hint={hint}
        error={error}
        className="max-w-md"
      />
      {busy && (
        <span role="status" className="mb-8 flex items-center gap-2 text-sm font-semibold text-ink-soft">
          <Spinner className="size-4 text-accent" />
          Scaling…
        </span>
      )}
    </div>
  );
}
