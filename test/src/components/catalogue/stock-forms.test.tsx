import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { ReceiveForm } from '@/components/catalogue/stock-forms';
import type { StockAnswer } from '@shared/types/catalogue';

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
