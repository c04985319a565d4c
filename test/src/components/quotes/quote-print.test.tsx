import { render, screen } from '@testing-library/react-native';

import { QuotePrint } from '@/components/quotes/quote-print';

import { quoteView } from './fixtures';

describe('QuotePrint', () => {
  it('puts the shop, the quote, the customer and the server’s totals in cents on the page', () => {
    render(<QuotePrint quote={quoteView({ version: 2, cautions: 'Check sag after 100 km.' })} />);
    expect(screen.getByTestId('print-shop')).toHaveTextContent(/Demo Suspension Works.*1 Workshop Lane.*\+00 111 222 · desk@demo.test/);
    expect(screen.getByTestId('print-number')).toHaveTextContent('Quote Q-0007, version 2');
    expect(screen.getByTestId('print-customer')).toHaveTextContent(/For Mara Linden.*rider@demo.test.*Bike: Blue one/);
    expect(screen.getByText('Fork spring 9.0 N/mm')).toBeOnTheScreen();
    expect(screen.getByText('Fork spring swap')).toBeOnTheScreen();
    // Sums from the fixture, worked by hand: 100.00 + 23.45, 21 % tax rounded half up.
    expect(screen.getByTestId('total-subtotal')).toHaveTextContent('€123.45');
    expect(screen.getByTestId('total-tax')).toHaveTextContent('€25.92');
    expect(screen.getByTestId('total-total')).toHaveTextContent('€149.37');
    expect(screen.getByTestId('total-deposit')).toHaveTextContent('€29.87');
    expect(screen.getByTestId('print-validity')).toHaveTextContent(/Valid until .*2026/);
    expect(screen.getByTestId('print-cautions')).toHaveTextContent(/Check sag after 100 km\./);
  });

  it('shows large totals to the cent in the quote’s currency, and no cautions block when there are none', () => {
    render(<QuotePrint quote={quoteView({ currency: 'GBP', totalCents: 1234567, bikeName: null })} />);
    expect(screen.getByTestId('total-total')).toHaveTextContent('£12,345.67');
    expect(screen.getByTestId('print-customer')).not.toHaveTextContent(/Bike/);
    expect(screen.queryByTestId('print-cautions')).toBeNull();
  });
});
