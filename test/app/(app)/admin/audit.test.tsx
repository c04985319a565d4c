import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

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

/** A damping rule as the audit keeps it (the row without its times); an invented shop row. */
const RULE = {
  id: 41,
  symptom: 'squats-throttle',
  end: 'rear',
  adjuster: 'ls-compression',
  direction: 'more',
  priority: 3,
  why: 'Slows the rear going down.',
  feelFor: 'The rear stays up.',
  claim: null,
  source: 'shop',
  active: true,
  createdById: 1,
};

const RULE_ENTRIES = [
  entry(6, { entity: 'damping-rule', entityKey: '41', before: RULE, after: { ...RULE, priority: 5, active: false } }),
  entry(5, { entity: 'damping-rule', entityKey: '41', action: 'create', before: null, after: RULE }),
  entry(4, { entity: 'damper-kind', entityKey: 'mid-valve', action: 'create', before: null, after: { key: 'mid-valve', label: 'Mid-valve', circuit: 'compression', speed: 'all' } }),
];

const page = (entries: AuditEntry[]): AuditPage => ({ entries, total: entries.length, page: 1, pageSize: 25 });

function serve(answers: Answers = {}) {
  fetchMock.mockImplementation(
    answerBy({
      'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('admin'))),
      'GET /api/audit?page=1&pageSize=25': respond(200, page(ENTRIES)),
      'GET /api/damper-kinds': respond(200, { kinds: [{ key: 'ls-compression', label: 'Low-speed compression', circuit: 'compression', speed: 'low' }] }),
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

  it('says what a damping rule edit changed and what an added rule or adjuster kind is', async () => {
    serve({ 'GET /api/audit?entity=damping-rule&page=1&pageSize=25': respond(200, page(RULE_ENTRIES.slice(0, 2))), 'GET /api/audit?page=1&pageSize=25': respond(200, page(RULE_ENTRIES)) });
    renderApp('/admin/audit');
    expect(await screen.findByText('Damping rule 41 changed')).toBeOnTheScreen();
    expect(screen.getAllByText('Squats under power, rear (shock)')).toHaveLength(1);
    expect(screen.getByText('Priority: 3 → 5')).toBeOnTheScreen();
    expect(screen.getByText('Active: yes, tried → no, switched off')).toBeOnTheScreen();
    // Unchanged fields are left out of an update.
    expect(screen.queryByText(/^Why: /)).toBeNull();
    expect(screen.getByText('Damping rule 41 created')).toBeOnTheScreen();
    expect(screen.getByText('Squats under power, rear (shock): Low-speed compression, more damping (turn in)')).toBeOnTheScreen();
    expect(screen.getByText('Priority 3 · added by the shop')).toBeOnTheScreen();
    expect(screen.getByText('Adjuster kind mid-valve created')).toBeOnTheScreen();
    expect(screen.getByText('Mid-valve: compression, all shaft speeds')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('radio', { name: 'Damping rules' }));
    await waitFor(() => expect(screen.queryByText('Adjuster kind mid-valve created')).toBeNull());
    expect(screen.getByText('Damping rule 41 changed')).toBeOnTheScreen();
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
