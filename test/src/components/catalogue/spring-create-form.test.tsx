import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { ApiError } from '@/api/client';
import { SpringCreateForm } from '@/components/catalogue/spring-create-form';
import type { SpringAnswer } from '@shared/types/catalogue';

const fill = (label: string, text: string) => fireEvent.changeText(screen.getByLabelText(label), text);

function fillRequired(unit: string, rate: string) {
  fill('SKU', 'KS46-0950');
  fireEvent.press(screen.getByRole('radio', { name: 'Shock' }));
  fill('Family', 'S46x150');
  fill(`Rate, ${unit}`, rate);
  fill('Free length, mm', '150');
  fill('Maximum deflection, mm', '60');
}

// The field rules and messages are those of springCreateSchema in shared/schemas/catalogue.schema.ts.
describe('SpringCreateForm', () => {
  it('sends a rate typed in kgf/mm in N/mm', async () => {
    // 1 kgf = 9.80665 N exactly (NIST SP 811, 2008, B.8), so 5 kgf/mm is 49.03325 N/mm.
    const onCreate = jest.fn(async () => ({}) as SpringAnswer);
    const onDone = jest.fn();
    render(<SpringCreateForm unit="kgf/mm" onCreate={onCreate} onDone={onDone} />);
    fillRequired('kgf/mm', '5');
    fill('Sale price, in cents', '14900');
    fireEvent.press(screen.getByRole('button', { name: 'Add the spring' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    const [sent] = onCreate.mock.calls[0] as unknown as [Record<string, unknown>];
    expect(sent.rateNmm).toBeCloseTo(49.03325, 10);
    expect(sent).toEqual(
      expect.objectContaining({ sku: 'KS46-0950', kind: 'shock', family: 'S46x150', freeLengthMm: 150, maxDeflectionMm: 60, priceCents: 14900, secondRateNmm: null, costCents: null, reorderPoint: 0 }),
    );
    expect(sent).not.toHaveProperty('onHand');
  });

  it('sends 1 kgf/mm as 9.80665 N/mm', async () => {
    const onCreate = jest.fn(async () => ({}) as SpringAnswer);
    render(<SpringCreateForm unit="kgf/mm" onCreate={onCreate} onDone={jest.fn()} />);
    fillRequired('kgf/mm', '1');
    fireEvent.press(screen.getByRole('button', { name: 'Add the spring' }));
    await waitFor(() => expect(onCreate).toHaveBeenCalledWith(expect.objectContaining({ rateNmm: 9.80665 })));
  });

  it('asks for a missing SKU and sends nothing', async () => {
    const onCreate = jest.fn(async () => ({}) as SpringAnswer);
    render(<SpringCreateForm unit="N/mm" onCreate={onCreate} onDone={jest.fn()} />);
    fillRequired('N/mm', '48');
    fill('SKU', '');
    fireEvent.press(screen.getByRole('button', { name: 'Add the spring' }));
    expect(await screen.findByText('Give the SKU the shop files this spring under.')).toBeOnTheScreen();
    expect(onCreate).not.toHaveBeenCalled();
  });

  it("puts the server's field message under its field", async () => {
    const onCreate = jest.fn(async () => {
      throw new ApiError(409, { code: 'sku-taken', message: 'That SKU is taken.', fields: { sku: 'KS46-0950 is already in the catalogue.' } });
    });
    const onDone = jest.fn();
    render(<SpringCreateForm unit="N/mm" onCreate={onCreate} onDone={onDone} />);
    fillRequired('N/mm', '48');
    fireEvent.press(screen.getByRole('button', { name: 'Add the spring' }));
    expect(await screen.findByText('KS46-0950 is already in the catalogue.')).toBeOnTheScreen();
    expect(onDone).not.toHaveBeenCalled();
  });
});
