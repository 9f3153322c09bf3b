import { it } from 'vitest';
import { check, memberDoc, run } from './engine/design-helpers';
it('probe', () => {
  const r = run(memberDoc({ length: '20 ft', section: { plates: { rootDepth: '60 in', tipDepth: '8 in', flangeWidth: '8 in', flangeThickness: '0.5 in', webThickness: '0.24 in' } },
    loads: { selfWeight: false, area: [], line: [], point: [{ case: 'L', value: '20 kip', at: '20 ft' }] } }));
  console.log(JSON.stringify(check(r, 'member.flexure')));
});
