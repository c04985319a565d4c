import { buildSpringQuery, NO_FILTERS } from '@/components/catalogue/spring-query';

const paramsOf = (query: string) => Object.fromEntries(new URLSearchParams(query));

// The parameter names are those GET /catalogue/springs reads (shared/schemas/catalogue.schema.ts).
describe('buildSpringQuery', () => {
  it('sends only the unit, the sort and the page when no filter is set', () => {
    expect(paramsOf(buildSpringQuery(NO_FILTERS, 'N/mm'))).toEqual({
      unit: 'N/mm',
      sort: 'sku',
      order: 'asc',
      page: '1',
      pageSize: '25',
    });
  });

  it('sends every filter in use, the rate range in the unit given', () => {
    const query = buildSpringQuery(
      { ...NO_FILTERS, q: ' KF37 ', kind: 'fork', family: 'F37x320', rateMin: '0,9', rateMax: '1.1', inStock: true, belowReorder: true, sort: 'rate', order: 'desc', page: 3 },
      'kgf/mm',
    );
    expect(paramsOf(query)).toEqual({
      q: 'KF37',
      kind: 'fork',
      family: 'F37x320',
      rateMin: '0.9',
      rateMax: '1.1',
      inStock: 'true',
      belowReorder: 'true',
      unit: 'kgf/mm',
      sort: 'rate',
      order: 'desc',
      page: '3',
      pageSize: '25',
    });
  });

  it('leaves out a rate bound that is not a number', () => {
    expect(paramsOf(buildSpringQuery({ ...NO_FILTERS, rateMin: 'soft', rateMax: '' }, 'lbf/in'))).not.toHaveProperty('rateMin');
  });
});
