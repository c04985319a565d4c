import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { ApiError } from '@/api/client';
import { ShopReadingsForm } from '@/components/quotes/shop-readings-form';
import { toDisplayUnits } from '@shared/garage/units';

const metric = toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' });

// Ten boxes and six diagrams per render: slow on a busy machine, not a hang.
jest.setTimeout(30_000);

function fill(end: 'front' | 'rear', extended: string, stat: [string, string], rider: [string, string]) {
  fireEvent.changeText(screen.getByTestId(`reading-${end}-extended-value`), extended);
  fireEvent.changeText(screen.getByTestId(`reading-${end}-static-pushed`), stat[0]);
  fireEvent.changeText(screen.getByTestId(`reading-${end}-static-lifted`), stat[1]);
  fireEvent.changeText(screen.getByTestId(`reading-${end}-rider-pushed`), rider[0]);
  fireEvent.changeText(screen.getByTestId(`reading-${end}-rider-lifted`), rider[1]);
}

describe('ShopReadingsForm', () => {
  it('sends both ends’ readings in mm', async () => {
    const onSave = jest.fn().mockResolvedValue({});
    render(<ShopReadingsForm ends={['front', 'rear']} travelMm={{ front: 130, rear: 135 }} units={metric} onSave={onSave} />);
    fill('front', '560', ['532', '540'], ['512', '520']);
    fill('rear', '600', ['586', '592'], ['541', '549']);
    fireEvent.press(screen.getByTestId('readings-save'));
    await waitFor(() =>
      expect(onSave).toHaveBeenCalledWith({
        front: { extendedMm: 560, staticMm: { pushedMm: 532, liftedMm: 540 }, riderMm: { pushedMm: 512, liftedMm: 520 } },
        rear: { extendedMm: 600, staticMm: { pushedMm: 586, liftedMm: 592 }, riderMm: { pushedMm: 541, liftedMm: 549 } },
      }),
    );
  });

  it('sizes one end when the desk says so, and leaves the other out', async () => {
    const onSave = jest.fn().mockResolvedValue({});
    render(<ShopReadingsForm ends={['front', 'rear']} travelMm={{ front: 130, rear: 135 }} units={metric} onSave={onSave} />);
    fireEvent.press(screen.getByRole('radio', { name: 'Shock only' }));
    expect(screen.queryByTestId('readings-front')).toBeNull();
    fill('rear', '600', ['586', '592'], ['541', '549']);
    fireEvent.press(screen.getByTestId('readings-save'));
    await waitFor(() => expect(onSave).toHaveBeenCalledTimes(1));
    expect(Object.keys(onSave.mock.calls[0][0])).toEqual(['rear']);
  });

  it('marks the missing boxes and sends nothing', async () => {
    const onSave = jest.fn();
    render(<ShopReadingsForm ends={['rear']} travelMm={{ rear: 135 }} units={metric} onSave={onSave} />);
    expect(screen.queryByRole('radiogroup', { name: 'Ends to size' })).toBeNull();
    fireEvent.press(screen.getByTestId('readings-save'));
    expect(await screen.findByTestId('readings-problem')).toBeOnTheScreen();
    expect(screen.getAllByText('Enter the length after lifting.')).toHaveLength(2);
    expect(onSave).not.toHaveBeenCalled();
  });

  it('shows the server’s refusal', async () => {
    const onSave = jest.fn().mockRejectedValue(new ApiError(400, { code: 'invalid', message: 'There is no weigh-in yet.' }));
    render(<ShopReadingsForm ends={['rear']} travelMm={{ rear: 135 }} units={metric} onSave={onSave} />);
    fill('rear', '600', ['586', '592'], ['541', '549']);
    fireEvent.press(screen.getByTestId('readings-save'));
    expect(await screen.findByText('There is no weigh-in yet.')).toBeOnTheScreen();
  });
});
