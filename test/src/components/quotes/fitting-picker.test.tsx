import { fireEvent, render, screen } from '@testing-library/react-native';

import { FittingPicker } from '@/components/quotes/fitting-picker';

// 2026-12-02 is a Wednesday (the Gregorian calendar).
const now = new Date(2026, 11, 2, 12, 0);

describe('FittingPicker', () => {
  it('offers the rest of today first and picks a slot as an ISO instant', () => {
    const onChange = jest.fn();
    render(<FittingPicker value={null} onChange={onChange} now={now} days={3} />);
    expect(screen.getAllByRole('radio', { name: /Dec/ })).toHaveLength(3);
    expect(screen.queryByRole('radio', { name: '12:00' })).toBeNull();
    fireEvent.press(screen.getByRole('radio', { name: '12:30' }));
    expect(onChange).toHaveBeenCalledWith(new Date(2026, 11, 2, 12, 30).toISOString());
  });

  it('shows another day’s slots from its morning once that day is chosen', () => {
    const onChange = jest.fn();
    render(<FittingPicker value={null} onChange={onChange} now={now} days={3} />);
    fireEvent.press(screen.getByTestId('fitting-day-2026-12-03'));
    expect(screen.getByTestId('fitting-day-2026-12-03')).toBeChecked();
    fireEvent.press(screen.getByRole('radio', { name: '08:00' }));
    expect(onChange).toHaveBeenCalledWith(new Date(2026, 11, 3, 8, 0).toISOString());
  });

  it('opens on the day of the booked fitting and marks its slot', () => {
    const booked = new Date(2026, 11, 4, 15, 0).toISOString();
    render(<FittingPicker value={booked} onChange={jest.fn()} now={now} days={5} />);
    expect(screen.getByTestId('fitting-day-2026-12-04')).toBeChecked();
    expect(screen.getByRole('radio', { name: '15:00' })).toBeChecked();
    expect(screen.getByRole('radio', { name: '08:00' })).not.toBeChecked();
  });
});
