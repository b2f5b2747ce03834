import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select-field';
import type { RoleLabel } from '../../../lib/swap-words';
import { hasSwapFilters, NO_SWAP_FILTERS, type SwapFilters } from '../swap-filters';

export interface SwapFilterBarProps {
  filters: SwapFilters;
  onChange: (filters: SwapFilters) => void;
  roles: string[];
  roleLabel: RoleLabel;
}

export function SwapFilterBar({ filters, onChange, roles, roleLabel }: SwapFilterBarProps) {
  return (
    <div
      role="search"
      aria-label="Filter the swaps"
      className="grid items-end gap-3 rounded-card border border-line bg-surface-sunk p-4 sm:grid-cols-2 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)_auto]"
    >
      <TextField
        label="Find a swap"
        type="search"
        placeholder="Food, note or tag"
        autoComplete="off"
        value={filters.text}
        onChange={(e) => onChange({ ...filters, text: e.target.value })}
        containerClassName="sm:col-span-2 lg:col-span-1"
      />
      <SelectField label="Status" value={filters.status} onChange={(e) => onChange({ ...filters, status: e.target.value as SwapFilters['status'] })}>
        <option value="all">Drafts and published</option>
        <option value="published">Published</option>
        <option value="draft">Drafts</option>
      </SelectField>
      <SelectField label="Role" value={filters.role} onChange={(e) => onChange({ ...filters, role: e.target.value })}>
        <option value="all">Any role or food</option>
        {roles.map((role) => (
          <option key={role} value={role}>
            {roleLabel(role)}
          </option>
        ))}
      </SelectField>
      <Button variant="quiet" onClick={() => onChange(NO_SWAP_FILTERS)} disabled={!hasSwapFilters(filters)}>
        Clear filters
      </Button>
    </div>
  );
}
