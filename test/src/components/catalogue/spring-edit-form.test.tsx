import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { SpringEditForm } from '@/components/catalogue/spring-edit-form';
import type { SpringAnswer, SpringDetail } from '@shared/types/catalogue';

// 9.25 N/mm is 0.943242... kgf/mm (1 kgf = 9.80665 N exactly, NIST SP 811 B.8): the box shows 0.943.
const spring = {
  id: 7,
  sku: 'KF37-0090',
  kind: 'fork',
  family: 'F37x320',
  rateNmm: 9.25,
  rateInUnit: 9.25 / 9.80665,
  secondRateNmm: null,
  secondRateInUnit: null,
  breakMm: null,
  freeLengthMm: 320,
  maxDeflectionMm: 190,
  innerDiameterMm: null,
  outerDiameterMm: 37,
  wireDiameterMm: 4.6,
  bin: 'FA-08',
  supplier: 'Tarnwell Coilworks',
  supplierCode: 'TW-37-0090',
  priceCents: 8900,
  costCents: null,
  reorderPoint: 2,
} as SpringDetail;

// The field rules are those of springUpdateSchema in shared/schemas/catalogue.schema.ts.
describe('SpringEditForm', () => {
  it('sends an emptied price as none and numbers as numbers, keeping a rate left as shown', async () => {
    const onSave = jest.fn(async () => ({}) as SpringAnswer);
    const onDone = jest.fn();
    render(<SpringEditForm spring={spring} unit="kgf/mm" onSave={onSave} onDone={onDone} />);
    expect(screen.getByLabelText('Rate, kgf/mm')).toHaveProp('value', '0.943');
    fireEvent.changeText(screen.getByLabelText('Sale price, in cents'), '');
    fireEvent.changeText(screen.getByLabelText('Reorder point'), '3');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(onSave).toHaveBeenCalledWith(
      expect.objectContaining({ sku: 'KF37-0090', rateNmm: 9.25, priceCents: null, costCents: null, reorderPoint: 3, outerDiameterMm: 37 }),
    );
  });

  it('sends a changed rate and size in N/mm and mm', async () => {
    const onSave = jest.fn(async () => ({}) as SpringAnswer);
    const onDone = jest.fn();
    render(<SpringEditForm spring={spring} unit="kgf/mm" onSave={onSave} onDone={onDone} />);
    fireEvent.changeText(screen.getByLabelText('Rate, kgf/mm'), '1');
    fireEvent.changeText(screen.getByLabelText('Free length, mm'), '330');
    fireEvent.press(screen.getByRole('radio', { name: 'Shock' }));
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(onSave).toHaveBeenCalledWith(expect.objectContaining({ rateNmm: 9.80665, freeLengthMm: 330, kind: 'shock' }));
  });

  it('refuses a price that is not whole cents', async () => {
    const onSave = jest.fn(async () => ({}) as SpringAnswer);
    render(<SpringEditForm spring={spring} unit="N/mm" onSave={onSave} onDone={jest.fn()} />);
    fireEvent.changeText(screen.getByLabelText('Sale price, in cents'), '12.5');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Sale price must be a whole number cents.')).toBeOnTheScreen();
    expect(onSave).not.toHaveBeenCalled();
  });
});
