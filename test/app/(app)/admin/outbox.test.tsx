import { fireEvent, screen, within } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';

import { accountUser, sessionAnswer } from '../../../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, respondError, type Answers } from '../../../src/helpers/fake-fetch';
import { renderApp } from '../../render-app';

let mockIsWide = false;
jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: mockIsWide ? 1280 : 390, isWide: mockIsWide }),
}));

const { fetchMock } = installFakeFetch();

const LINK = 'http://shop.local:8080/reset?token=abc_123-XYZ';
const ENTRY = {
  id: '2025-12-02T10-00-00-000Z-1a2b3c4d',
  from: 'Sagwright <no-reply@sagwright.invalid>',
  to: ['rider@demo.test'],
  subject: 'Reset your Sagwright password',
  date: '2025-12-02T10:00:00.000Z',
};
const MAIL = {
  ...ENTRY,
  text: `Hello Mara Linden,\n\nTo choose a new one, open this link within 30 minutes:\n\n${LINK}.\n\nIf it was not you, ignore this mail.`,
  html: null,
};

function serve(answers: Answers) {
  fetchMock.mockImplementation(
    answerBy({ 'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('admin'))), ...answers }),
  );
}

beforeEach(() => setAuthToken(null));

describe('Outbox screen', () => {
  afterEach(() => {
    jest.useRealTimers();
    mockIsWide = false;
  });

  it.each([
    ['phone', false],
    ['wide window', true],
  ])('on a %s lists the mails and opens one with its links clickable', async (_, wide) => {
    mockIsWide = wide;
    serve({
      'GET /api/dev/outbox': respond(200, { mails: [ENTRY] }),
      [`GET /api/dev/outbox/${ENTRY.id}`]: respond(200, { mail: MAIL }),
    });
    renderApp('/admin/outbox');
    fireEvent.press(await screen.findByRole('button', { name: 'Reset your Sagwright password, to rider@demo.test' }));

    const reader = within(await screen.findByTestId('mail-reader'));
    expect(reader.getByText(/open this link within 30 minutes/)).toBeOnTheScreen();
    // The full stop after the address belongs to the sentence, not to the link.
    expect(reader.getByRole('link', { name: LINK })).toHaveProp('href', LINK);
    expect(screen.queryByRole('button', { name: 'All mails' }) === null).toBe(wide);
  });

  it('says when there is no mail yet', async () => {
    serve({ 'GET /api/dev/outbox': respond(200, { mails: [] }) });
    renderApp('/admin/outbox');
    expect(await screen.findByText('No mail yet')).toBeOnTheScreen();
  });

  it('explains that a production server keeps no outbox', async () => {
    serve({ 'GET /api/dev/outbox': respondError(404, 'not-found', 'No API route GET /dev/outbox.') });
    renderApp('/admin/outbox');
    expect(await screen.findByText('This server sends real mail, so it keeps no outbox.')).toBeOnTheScreen();
  });
});
