import { render, screen, within } from '@testing-library/react-native';

import { SAFETY_CAUTIONS, SafetyNotice } from '@/components/ui/safety-notice';

describe('SafetyNotice', () => {
  it('lists every caution as its own list item', () => {
    render(<SafetyNotice />);
    const items = within(screen.getByTestId('safety-notice')).getAllByRole('listitem');
    expect(items).toHaveLength(SAFETY_CAUTIONS.length);
    items.forEach((item, i) => expect(item).toHaveTextContent(SAFETY_CAUTIONS[i]));
  });

  // The cautions the Foundation issue requires, checked by their substance so that
  // rewording a caution cannot silently drop one.
  it.each([
    ['stored energy', /loaded spring stores dangerous energy/i],
    ['compressors', /spring compressors/i],
    ['a record to undo', /record every change.*undone/i],
    ["the maker's manual", /maker's service manual/i],
    ['a qualified mechanic', /when in doubt.*qualified mechanic/i],
    ['local rules', /local rules may apply/i],
  ])('warns about %s', (_, pattern) => {
    render(<SafetyNotice />);
    expect(screen.getAllByText(pattern)).toHaveLength(1);
  });

  it('shows a heading, with a default and a caller-given title', () => {
    const { rerender } = render(<SafetyNotice />);
    expect(screen.getByRole('header')).toHaveTextContent('Work safely');
    rerender(<SafetyNotice title="Before you take the shock off" />);
    expect(screen.getByRole('header')).toHaveTextContent('Before you take the shock off');
  });
});
