import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { ApiError } from '@/api/client';
import { DepositPayment } from '@/components/quotes/deposit-payment';

describe('DepositPayment', () => {
  it('pays with the chosen test card and says so when the card is declined', async () => {
    const onPay = jest
      .fn<Promise<unknown>, [string]>()
      .mockRejectedValue(new ApiError(402, { code: 'card-declined', message: 'Declined.' }));
    render(<DepositPayment amountCents={2987} currency="EUR" onPay={onPay} />);
    fireEvent.press(screen.getByRole('radio', { name: 'A card that is declined' }));
    fireEvent.press(screen.getByRole('button', { name: 'Pay €29.87' }));
    expect(await screen.findByText(/The card was declined/)).toBeOnTheScreen();
    expect(onPay).toHaveBeenCalledWith('pm_card_chargeDeclined');

    fireEvent.press(screen.getByRole('radio', { name: 'A card that pays' }));
    onPay.mockResolvedValue({});
    fireEvent.press(screen.getByRole('button', { name: 'Pay €29.87' }));
    expect(onPay).toHaveBeenLastCalledWith('pm_card_visa');
    await waitFor(() => expect(screen.queryByText(/The card was declined/)).toBeNull());
    expect(screen.getByRole('button', { name: 'Pay €29.87' })).toBeEnabled();
  });
});
