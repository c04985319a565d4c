import { fireEvent, screen } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';
import type { AuditEntry, AuditPage } from '@shared/types/shop-data';

import { accountUser, sessionAnswer } from '../../../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, type Answers } from '../../../src/helpers/fake-fetch';
import { renderApp } from '../../render-app';

jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: 390, isWide: false }),
}));

const { fetchMock } = installFakeFetch();

/** Invented terms, as the server's audit keeps them (the settings view without its time). */
const TERMS = {
  labourRateCentsPerHour: 7000,
  taxBasisPoints: 2000,
  deposit: { kind: 'percent', basisPoints: 3000 },
  operations: [{ code: 'sag-setup', label: 'Sag set-up', minutes: 20 }],
  quoteValidityDays: 30,
  cautions: '',
};

const entry = (id: number, fields: Partial<AuditEntry>): AuditEntry => ({
  id,
  at: '2026-12-02T09:00:00.000Z',
  actorId: 1,
  actorName: 'Ines Harrow',
  entity: 'shop-settings',
  entityKey: 'quote-terms',
  action: 'update',
  before: TERMS,
  after: TERMS,
  ...fields,
});

const ENTRIES = [
  entry(3, { after: { ...TERMS, labourRateCentsPerHour: 7550, deposit: { kind: 'fixed', cents: 5000 }, cautions: 'Allow a day.' } }),
  entry(2, { entity: 'engine-setting', entityKey: 'dampingRatio', before: { value: 0.3 }, after: { value: 0.45 } }),
  entry(1, { action: 'create', before: null }),
];

const page = (entries: AuditEntry[]): AuditPage => ({ entries, total: entries.length, page: 1, pageSize: 25 });

function serve(answers: Answers = {}) {
  fetchMock.mockImplementation(
    answerBy({
      'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('admin'))),
      'GET /api/audit?page=1&pageSize=25': respond(200, page(ENTRIES)),
      ...answers,
    }),
  );
}

beforeEach(() => setAuthToken(null));

describe('Audit screen', () => {
  it('says which shop settings changed, from what to what, and names the other entities in words', async () => {
    serve();
    renderApp('/admin/audit');
    expect(await screen.findByText('Labour rate: €70.00 an hour → €75.50 an hour')).toBeOnTheScreen();
    expect(screen.getByText('Deposit: 30 % of the total → €50.00 fixed')).toBeOnTheScreen();
    expect(screen.getByText('Cautions: none → "Allow a day."')).toBeOnTheScreen();
    // Unchanged terms are left out of an update.
    expect(screen.queryByText(/^Tax rate: .* → /)).toBeNull();
    expect(screen.getByText('Engine setting dampingRatio changed')).toBeOnTheScreen();
    // A first save lists every term it set.
    expect(screen.getByText('Shop settings created')).toBeOnTheScreen();
    expect(screen.getByText('Tax rate: 20 %')).toBeOnTheScreen();
    expect(screen.getByText('Operations: Sag set-up 20 min')).toBeOnTheScreen();
  });

  it('filters to shop settings edits', async () => {
    serve({ 'GET /api/audit?entity=shop-settings&page=1&pageSize=25': respond(200, page([ENTRIES[0]])) });
    renderApp('/admin/audit');
    await screen.findByText('Engine setting dampingRatio changed');
    fireEvent.press(screen.getByRole('radio', { name: 'Shop settings' }));
    expect(await screen.findByText('Shop settings changed')).toBeOnTheScreen();
    expect(screen.queryByText('Engine setting dampingRatio changed')).toBeNull();
  });
});
