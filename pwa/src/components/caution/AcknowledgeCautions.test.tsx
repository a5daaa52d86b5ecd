import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { initI18n } from '../../i18n';
import { addSignedInStrings } from '../../i18n/signedInStrings';
import { AcknowledgeCautions } from './AcknowledgeCautions';

const noEscalation = { required: false, triggers: [], rulesVersion: 'test' };
const escalation = {
  required: true,
  triggers: [{ ruleId: 'explosive-precursor', reason: 'Explosive precursor', compoundId: 'ammonium-nitrate', name: 'Ammonium nitrate', score: 0.9 }],
  rulesVersion: 'test',
};

beforeAll(async () => {
  await initI18n();
  addSignedInStrings();
});
afterEach(cleanup);

// React sets `disabled` on Ionic's custom element as a property, not an attribute.
function button(): HTMLElement & { disabled: boolean } {
  return screen.getByText('Acknowledge and mark reviewed by inspector').closest('ion-button') as HTMLElement & { disabled: boolean };
}

describe('AcknowledgeCautions', () => {
  it('keeps the button disabled until the checkbox is ticked, then reports the acknowledgement', () => {
    let acknowledged = 0;
    render(<AcknowledgeCautions escalation={noEscalation} acknowledged={false} onAcknowledge={() => (acknowledged += 1)} />);
    expect(button().disabled).toBe(true);
    fireEvent.click(screen.getByRole('checkbox'));
    expect(button().disabled).toBe(false);
    fireEvent.click(button());
    expect(acknowledged).toBe(1);
    expect(screen.queryByTestId('escalation-notice')).toBeNull();
  });

  it('says plainly that an escalated finding goes to the safety officer, and that nothing was sent yet', () => {
    render(<AcknowledgeCautions escalation={escalation} acknowledged={false} onAcknowledge={() => undefined} />);
    const notice = screen.getByTestId('escalation-notice');
    expect(notice.textContent).toMatch(/goes to the safety officer/);
    expect(notice.textContent).toMatch(/Ammonium nitrate: Explosive precursor/);
    expect(notice.textContent).toMatch(/when this scan is saved to a case.*Nothing has been sent yet/s);
  });

  it('shows the acknowledged state instead of the controls', () => {
    render(<AcknowledgeCautions escalation={noEscalation} acknowledged onAcknowledge={() => undefined} />);
    expect(screen.getByTestId('acknowledged').textContent).toMatch(/reviewed by inspector/);
    expect(screen.queryByRole('checkbox')).toBeNull();
  });
});
