/**
 * The rewrite's targets form as a cook uses it (Testing Library, happy-dom): the suggested targets,
 * messages that name the field, limits that open when one of them is wrong, and the numbers it hands on.
 */
import { zodResolver } from '@hookform/resolvers/zod';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useForm } from 'react-hook-form';
import { describe, expect, it, vi } from 'vitest';
import { TargetsForm } from '../../src/features/rewrite/components/targets-form';
import {
  initialFormInput,
  rewriteFormSchema,
  type DefaultTargets,
  type RewriteFormInput,
  type RewriteFormValues,
} from '../../src/features/rewrite/rewrite-form';

const DEFAULTS: DefaultTargets = { proteinMinG: 26, kcalMax: 400, source: { kind: 'recipe' } };

function Harness({ start, onValues }: { start?: Partial<RewriteFormInput['targets']>; onValues: (values: RewriteFormValues) => void }) {
  const initial = initialFormInput(DEFAULTS);
  const form = useForm<RewriteFormInput, unknown, RewriteFormValues>({
    resolver: zodResolver(rewriteFormSchema),
    defaultValues: { ...initial, targets: { ...initial.targets, ...start } },
  });
  return (
    <TargetsForm
      form={form}
      lines={[]}
      defaults={DEFAULTS}
      usingDefaults
      onUseDefaults={() => {}}
      onSubmit={() => void form.handleSubmit(onValues)()}
      submitting={false}
      waitingFor={null}
    />
  );
}

describe('TargetsForm', () => {
  it('starts from the suggested targets and says where they come from', () => {
    render(<Harness onValues={() => {}} />);
    expect(screen.getByLabelText(/Protein, at least/)).toHaveProperty('value', '26');
    expect(screen.getByLabelText(/Calories, at most/)).toHaveProperty('value', '400');
    expect(screen.getByText(/30 % more protein and 20 % fewer calories/)).toBeTruthy();
  });

  it('hands on numbers, an empty limit meaning none', async () => {
    const onValues = vi.fn();
    const user = userEvent.setup();
    render(<Harness onValues={onValues} />);
    const protein = screen.getByLabelText(/Protein, at least/);
    await user.clear(protein);
    await user.type(protein, '32');
    await user.click(screen.getByRole('button', { name: /rewrite/i }));
    expect(onValues).toHaveBeenCalledTimes(1);
    const values = onValues.mock.calls[0][0] as RewriteFormValues;
    expect(values.targets.proteinMinG).toBe(32);
    expect(values.targets.kcalMax).toBe(400);
    expect(values.targets.fiberMinG).toBeUndefined();
    expect(values.volumeTolerancePct).toBe(10);
  });

  it('names the field that is wrong and sends nothing', async () => {
    const onValues = vi.fn();
    const user = userEvent.setup();
    render(<Harness onValues={onValues} />);
    const kcal = screen.getByLabelText(/Calories, at most/);
    await user.clear(kcal);
    await user.type(kcal, 'lots');
    await user.click(screen.getByRole('button', { name: /rewrite/i }));
    expect(await screen.findByText('Enter the calorie ceiling as a number.')).toBeTruthy();
    expect(onValues).not.toHaveBeenCalled();
  });

  it('opens the folded limits when one of them is wrong', async () => {
    const onValues = vi.fn();
    const user = userEvent.setup();
    // Opened from the start when a limit is set; folded first here so the error has to open it.
    const { container } = render(<Harness onValues={onValues} />);
    const limits = container.querySelector('details');
    expect(limits?.open).toBe(false);
    limits!.open = true;
    const sodium = screen.getByLabelText(/Sodium, at most/);
    await user.type(sodium, '-5');
    limits!.open = false;
    await user.click(screen.getByRole('button', { name: /rewrite/i }));
    expect(await screen.findByText('The sodium ceiling cannot be negative.')).toBeTruthy();
    expect(container.querySelector('details')?.open).toBe(true);
    expect(onValues).not.toHaveBeenCalled();
  });
});
