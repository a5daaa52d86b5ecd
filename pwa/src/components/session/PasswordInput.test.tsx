import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { initI18n } from '../../i18n';
import { PasswordInput, type PasswordInputProps } from './PasswordInput';

beforeAll(async () => {
  await initI18n();
});
afterEach(cleanup);

function Controlled(props: Omit<PasswordInputProps, 'value' | 'onValue'>) {
  const [value, setValue] = useState('');
  return <PasswordInput {...props} value={value} onValue={setValue} />;
}

describe('PasswordInput', () => {
  it('is a labelled password field whose text the toggle shows and hides again', () => {
    render(<Controlled label="Password" autoComplete="current-password" name="password" />);
    const input = screen.getByLabelText('Password') as HTMLInputElement;
    expect(input.type).toBe('password');
    expect(input.getAttribute('autocomplete')).toBe('current-password');
    expect(input.name).toBe('password');
    fireEvent.change(input, { target: { value: 'field day 7' } });
    expect(input.value).toBe('field day 7');
    const toggle = screen.getByRole('button', { name: 'Show password' });
    expect(toggle.getAttribute('aria-controls')).toBe(input.id);
    expect(toggle.getAttribute('aria-pressed')).toBe('false');
    fireEvent.click(toggle);
    expect(input.type).toBe('text');
    expect(toggle.getAttribute('aria-pressed')).toBe('true');
    expect(input.value).toBe('field day 7');
    fireEvent.click(toggle);
    expect(input.type).toBe('password');
  });

  it('names a PIN as a PIN, keeps the numeric keyboard and never offers the password manager', () => {
    render(<Controlled label="New PIN" secret="pin" inputMode="numeric" autoComplete="off" />);
    const input = screen.getByLabelText('New PIN') as HTMLInputElement;
    expect(input.getAttribute('inputmode')).toBe('numeric');
    expect(input.getAttribute('autocomplete')).toBe('off');
    expect(screen.getByRole('button', { name: 'Show PIN' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Show password' })).toBeNull();
  });

  it('gives every field its own id, so two on one form keep their own labels', () => {
    render(
      <>
        <Controlled label="New password" autoComplete="new-password" />
        <Controlled label="The same password again" autoComplete="new-password" />
      </>,
    );
    const [first, second] = [screen.getByLabelText('New password'), screen.getByLabelText('The same password again')];
    expect(first.id).not.toBe(second.id);
    fireEvent.click(screen.getAllByRole('button', { name: 'Show password' })[1]);
    expect((first as HTMLInputElement).type).toBe('password');
    expect((second as HTMLInputElement).type).toBe('text');
  });
});
