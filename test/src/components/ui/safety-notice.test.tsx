import { render } from '@testing-library/react-native';

import { SAFETY_CAUTIONS, SafetyNotice } from '@/components/ui/safety-notice';

import { getAllByRole, getByTestId, queryAllByText, textOf } from '../../helpers/web-queries';

describe('SafetyNotice', () => {
  it('lists every caution as its own list item', () => {
    render(<SafetyNotice />);
    const items = getAllByRole('listitem', getByTestId('safety-notice'));
    expect(items.map(textOf)).toEqual([...SAFETY_CAUTIONS]);
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
    expect(queryAllByText(pattern)).toHaveLength(1);
  });

  it('shows a heading, with a default and a caller-given title', () => {
    const { rerender } = render(<SafetyNotice />);
    expect(getAllByRole('heading').map(textOf)).toEqual(['Work safely']);
    rerender(<SafetyNotice title="Before you take the shock off" />);
    expect(getAllByRole('heading').map(textOf)).toEqual(['Before you take the shock off']);
  });
});
