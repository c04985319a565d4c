import { render, screen } from '@testing-library/react-native';

import { QuoteTotals } from '@/components/quotes/quote-totals';

import { quoteView } from './fixtures';

describe('QuoteTotals', () => {
  it('shows the server’s integer cents exactly, in the quote’s currency', () => {
    render(<QuoteTotals quote={quoteView()} />);
    expect(screen.getByTestId('total-subtotal')).toHaveTextContent('€123.45');
    expect(screen.getByTestId('total-parts')).toHaveTextContent('€100.00');
    expect(screen.getByTestId('total-labour')).toHaveTextContent('€23.45');
    expect(screen.getByTestId('total-tax')).toHaveTextContent('€25.92');
    expect(screen.getByText('Tax (21%)')).toBeOnTheScreen();
    expect(screen.getByTestId('total-total')).toHaveTextContent('€149.37');
    expect(screen.getByTestId('total-deposit')).toHaveTextContent('€29.87');
    expect(screen.queryByTestId('total-balance')).toBeNull();
  });

  it('adds what was paid and the balance due once a deposit is in, in another currency too', () => {
    render(<QuoteTotals quote={quoteView({ currency: 'GBP', paidCents: 2987, balanceDueCents: 11950, totalCents: 1234567 })} />);
    expect(screen.getByTestId('total-total')).toHaveTextContent('£12,345.67');
    expect(screen.getByTestId('total-paid')).toHaveTextContent('£29.87');
    expect(screen.getByTestId('total-balance')).toHaveTextContent('£119.50');
  });
});
