import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { HoldForm, ReceiveForm, ReleaseHoldForm } from '@/components/catalogue/stock-forms';
import type { StockAnswer, StockHoldView } from '@shared/types/catalogue';

function renderForm() {
  const onReceive = jest.fn(async () => ({}) as StockAnswer);
  const onDone = jest.fn();
  render(<ReceiveForm onReceive={onReceive} onDone={onDone} />);
  return { onReceive, onDone };
}

// The messages are those of receiveSchema in shared/schemas/catalogue.schema.ts.
describe('ReceiveForm', () => {
  it('asks for a quantity and a reason before sending anything', async () => {
    const { onReceive } = renderForm();
    fireEvent.press(screen.getByRole('button', { name: 'Receive' }));
    expect(await screen.findByText('Quantity is missing.')).toBeOnTheScreen();
    expect(screen.getByText(/Say why, for the stock history/)).toBeOnTheScreen();
    expect(onReceive).not.toHaveBeenCalled();
  });

  it.each([
    ['0', 'Quantity must be at least 1.'],
    ['2.5', 'Quantity must be a whole number.'],
  ])('refuses a quantity of %s', async (quantity, message) => {
    const { onReceive } = renderForm();
    fireEvent.changeText(screen.getByLabelText('Quantity received'), quantity);
    fireEvent.changeText(screen.getByLabelText('Reason'), 'Delivery');
    fireEvent.press(screen.getByRole('button', { name: 'Receive' }));
    expect(await screen.findByText(message)).toBeOnTheScreen();
    expect(onReceive).not.toHaveBeenCalled();
  });

  it('sends the quantity as a number with the trimmed reason', async () => {
    const { onReceive, onDone } = renderForm();
    fireEvent.changeText(screen.getByLabelText('Quantity received'), '3');
    fireEvent.changeText(screen.getByLabelText('Reason'), '  Delivery note 4711 ');
    fireEvent.press(screen.getByRole('button', { name: 'Receive' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(onReceive).toHaveBeenCalledWith({ quantity: 3, reason: 'Delivery note 4711' });
  });
});

// The messages are those of reserveSchema and releaseSchema in shared/schemas/catalogue.schema.ts.
describe('HoldForm', () => {
  it('asks who the springs are held for', async () => {
    const onHold = jest.fn(async () => ({}) as StockAnswer);
    render(<HoldForm onHold={onHold} onDone={jest.fn()} />);
    fireEvent.changeText(screen.getByLabelText('Quantity to hold'), '2');
    fireEvent.changeText(screen.getByLabelText('Reason'), 'Promised by phone');
    fireEvent.press(screen.getByRole('button', { name: 'Hold' }));
    expect(await screen.findByText(/Say who or what the springs are held for/)).toBeOnTheScreen();
    expect(onHold).not.toHaveBeenCalled();
  });
});

describe('ReleaseHoldForm', () => {
  const hold: StockHoldView = {
    id: 12,
    springId: 7,
    holder: { kind: 'manual', name: 'Race team' },
    quantity: 3,
    heldQuantity: 3,
    status: 'open',
    reason: 'Promised',
    createdAt: '2026-12-01T09:00:00.000Z',
    createdBy: { id: 3, name: 'Counter' },
  };

  it.each([
    ['', { holdId: 12, reason: 'Collected' }],
    ['2', { holdId: 12, quantity: 2, reason: 'Collected' }],
  ])('names the hold, and releases all of it when the quantity is left empty (%j)', async (quantity, sent) => {
    const onRelease = jest.fn(async () => ({}) as StockAnswer);
    const onDone = jest.fn();
    render(<ReleaseHoldForm hold={hold} onRelease={onRelease} onDone={onDone} />);
    fireEvent.changeText(screen.getByLabelText('Quantity to release'), quantity);
    fireEvent.changeText(screen.getByLabelText('Reason for the release'), 'Collected');
    fireEvent.press(screen.getByRole('button', { name: 'Release hold #12' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(onRelease).toHaveBeenCalledWith(sent);
  });
});
