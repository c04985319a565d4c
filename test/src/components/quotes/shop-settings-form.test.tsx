import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { ApiError } from '@/api/client';
import { ShopSettingsForm } from '@/components/quotes/shop-settings-form';
import type { ShopSettingsInput } from '@shared/schemas/shop-settings.schema';
import type { ShopSettingsView } from '@shared/types/quote';

const settings: ShopSettingsView = {
  labourRateCentsPerHour: 7200,
  taxBasisPoints: 2000,
  deposit: { kind: 'percent', basisPoints: 2500 },
  operations: [{ code: 'fork-spring', label: 'Fit fork springs', minutes: 90 }],
  quoteValidityDays: 30,
  cautions: 'Ride gently for the first 50 km.',
  publicUrl: null,
  updatedAt: '2025-01-01T00:00:00.000Z',
};

describe('ShopSettingsForm', () => {
  it('sends the typed rate, tax and deposit as integer cents and basis points', async () => {
    const save = jest.fn<Promise<void>, [ShopSettingsInput]>().mockResolvedValue();
    render(<ShopSettingsForm settings={settings} save={save} />);
    expect(screen.getByLabelText('Labour rate per hour')).toHaveDisplayValue('72.00');
    expect(screen.getByLabelText('Tax rate (%)')).toHaveDisplayValue('20');
    fireEvent.changeText(screen.getByLabelText('Labour rate per hour'), '72.5');
    fireEvent.changeText(screen.getByLabelText('Tax rate (%)'), '7.5');
    fireEvent.press(screen.getByRole('radio', { name: 'Fixed sum' }));
    fireEvent.changeText(screen.getByLabelText('Deposit (fixed sum)'), '50.1');
    fireEvent.press(screen.getByRole('button', { name: 'Add an operation' }));
    fireEvent.changeText(screen.getByLabelText('Operation 2 code'), 'shock-spring');
    fireEvent.changeText(screen.getByLabelText('Operation 2 name'), 'Fit a shock spring');
    fireEvent.changeText(screen.getByLabelText('Operation 2 standard minutes'), '60');
    fireEvent.changeText(screen.getByLabelText('Public web address'), ' HTTPS://Shop.Example/ ');
    fireEvent.press(screen.getByRole('button', { name: 'Save the shop settings' }));
    await waitFor(() => expect(save).toHaveBeenCalled());
    expect(save.mock.calls[0][0]).toEqual({
      labourRateCentsPerHour: 7250,
      taxBasisPoints: 750,
      deposit: { kind: 'fixed', cents: 5010 },
      operations: [
        { code: 'fork-spring', label: 'Fit fork springs', minutes: 90 },
        { code: 'shock-spring', label: 'Fit a shock spring', minutes: 60 },
      ],
      quoteValidityDays: 30,
      cautions: 'Ride gently for the first 50 km.',
      publicUrl: 'https://shop.example',
    });
  });

  it('refuses an amount it cannot read and sends nothing', async () => {
    const save = jest.fn<Promise<void>, [ShopSettingsInput]>().mockResolvedValue();
    render(<ShopSettingsForm settings={settings} save={save} />);
    fireEvent.changeText(screen.getByLabelText('Labour rate per hour'), 'abc');
    fireEvent.press(screen.getByRole('button', { name: 'Remove operation 1' }));
    fireEvent.press(screen.getByRole('button', { name: 'Save the shop settings' }));
    expect(await screen.findByText('Type the hourly rate as an amount, like 72.00.')).toBeOnTheScreen();
    expect(screen.getByText('List at least one operation.')).toBeOnTheScreen();
    expect(save).not.toHaveBeenCalled();
  });

  it('shows the server’s field errors under the fields they name', async () => {
    const save = jest
      .fn<Promise<void>, [ShopSettingsInput]>()
      .mockRejectedValue(
        new ApiError(400, { code: 'invalid', message: 'Check the settings.', fields: { taxBasisPoints: 'Tax too high for this shop.', 'operations[0].code': 'That code is taken.' } }),
      );
    render(<ShopSettingsForm settings={settings} save={save} />);
    fireEvent.press(screen.getByRole('button', { name: 'Save the shop settings' }));
    expect(await screen.findByText('Tax too high for this shop.')).toBeOnTheScreen();
    expect(screen.getByText('That code is taken.')).toBeOnTheScreen();
  });
});
