/**
 * The Kitchen's paste form as a cook uses it (Testing Library, happy-dom): its checks load on the first
 * submit, a wrong field gets its message and the focus, messages follow each change after that, and a
 * good form hands on the text and the servings as a number.
 */
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { RecipeInputForm } from '../../src/features/analysis/components/recipe-input-form';

describe('recipe input form', () => {
  it('names what is wrong, focuses it, and clears the message once the cook fixes it', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn();
    render(<RecipeInputForm onSubmit={onSubmit} />);
    expect(screen.getByText('No ingredient lines yet.')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Analyse recipe' }));
    expect(await screen.findByText('Paste at least one ingredient line.')).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByLabelText('Ingredients'));
    expect(onSubmit).not.toHaveBeenCalled();

    await user.type(screen.getByLabelText('Ingredients'), '2 cups milk{enter}{enter}1 egg');
    expect(screen.queryByText('Paste at least one ingredient line.')).toBeNull();
    expect(screen.getByText('2 ingredient lines.')).toBeTruthy();

    await user.clear(screen.getByLabelText('Servings'));
    expect(screen.getByText('Enter how many servings the recipe makes.')).toBeTruthy();
    await user.type(screen.getByLabelText('Servings'), '2.5');
    expect(screen.getByText('Use a whole number of servings.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Analyse recipe' }));
    expect(document.activeElement).toBe(screen.getByLabelText('Servings'));
    expect(onSubmit).not.toHaveBeenCalled();

    await user.clear(screen.getByLabelText('Servings'));
    await user.type(screen.getByLabelText('Servings'), '6');
    await user.click(screen.getByRole('button', { name: 'Analyse recipe' }));
    await vi.waitFor(() => expect(onSubmit).toHaveBeenCalledWith('2 cups milk\n\n1 egg', 6));
    expect(screen.queryByText(/servings the recipe makes|whole number/)).toBeNull();
  });

  it('starts from the text and servings it is given and submits them unchanged', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn();
    render(<RecipeInputForm onSubmit={onSubmit} defaultText={'8 oz macaroni\n3 tbsp butter'} defaultServings={3} submitLabel="Read it" />);
    expect(screen.getByText('2 ingredient lines.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Read it' }));
    await vi.waitFor(() => expect(onSubmit).toHaveBeenCalledWith('8 oz macaroni\n3 tbsp butter', 3));
  });

  it('says how many lines are too many before the cook submits', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn();
    const text = Array.from({ length: 101 }, (_, i) => `${i + 1} g salt`).join('\n');
    render(<RecipeInputForm onSubmit={onSubmit} defaultText={text} />);
    expect(screen.getByText('101 ingredient lines — at most 100 lines.')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Analyse recipe' }));
    expect(await screen.findByText(/^A recipe has at most 100 ingredient lines; this has 101\./)).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
  });
});
