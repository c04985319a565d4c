import { buildMovementFilterQuery, buildMovementQuery, NO_MOVEMENT_FILTERS, parseDay } from '@/components/catalogue/movement-query';

const paramsOf = (query: string) => Object.fromEntries(new URLSearchParams(query));

// The parameter names are those GET /stock/movements reads (movementListSchema in
// shared/schemas/catalogue.schema.ts); its `to` is exclusive (server/services/stock.service.ts).
describe('buildMovementQuery', () => {
  it('sends only the page when no filter is set, and the export nothing', () => {
    expect(paramsOf(buildMovementQuery(NO_MOVEMENT_FILTERS))).toEqual({ page: '1', pageSize: '25' });
    expect(buildMovementFilterQuery(NO_MOVEMENT_FILTERS).toString()).toBe('');
  });

  it('sends every filter in use, the days as whole UTC days with the last one included', () => {
    const filters = {
      kind: 'receive' as const,
      from: '2025-01-31',
      to: '2025-02-28',
      importBatchId: 4,
      spring: { id: 12, sku: 'KF37-0090' },
      page: 2,
    };
    const filterParams = {
      springId: '12',
      kind: 'receive',
      importBatchId: '4',
      from: '2025-01-31T00:00:00Z',
      to: '2025-03-01T00:00:00Z',
    };
    expect(paramsOf(buildMovementQuery(filters))).toEqual({ ...filterParams, page: '2', pageSize: '25' });
    expect(paramsOf(buildMovementFilterQuery(filters).toString())).toEqual(filterParams);
  });

  it('leaves out a day that is not a date', () => {
    expect(paramsOf(buildMovementQuery({ ...NO_MOVEMENT_FILTERS, from: '2025-02-30', to: '31/01/2025' }))).toEqual({ page: '1', pageSize: '25' });
  });
});

describe('parseDay', () => {
  it('takes YYYY-MM-DD only, and only real dates', () => {
    expect(parseDay(' 2024-02-29 ')).toBe('2024-02-29');
    expect(parseDay('2023-02-29')).toBeUndefined();
    expect(parseDay('')).toBeUndefined();
  });
});
