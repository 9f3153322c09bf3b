/**
 * Design-document paths in plain words for the compare table: "member.length" → "Reach: length".
 * Groups follow the design desk (Reach, Section, Loads, Support, Limits, Settings).
 */
const WORDS: Record<string, string> = {
  units: 'Settings: result units',
  method: 'Settings: design method (LRFD or ASD)',
  'member.length': 'Reach: length',
  'member.spacing': 'Reach: spacing',
  'member.unbracedLength': 'Reach: unbraced length of the bottom flange',
  'member.section.shape': 'Section: shape',
  'member.section.tipDepth': 'Section: tip depth (tapered web)',
  'member.section.plates.rootDepth': 'Section: built-up root depth',
  'member.section.plates.tipDepth': 'Section: built-up tip depth',
  'member.section.plates.flangeWidth': 'Section: built-up flange width',
  'member.section.plates.flangeThickness': 'Section: built-up flange thickness',
  'member.section.plates.webThickness': 'Section: built-up web thickness',
  'member.steel.Fy': 'Section: steel yield stress Fy',
  'member.steel.E': 'Section: steel modulus E',
  'loads.selfWeight': 'Loads: self-weight included',
  'loads.area': 'Loads: area loads',
  'loads.line': 'Loads: line loads',
  'loads.point': 'Loads: point loads',
  'loads.area[].case': 'Loads: area load #, case',
  'loads.area[].value': 'Loads: area load #, value',
  'loads.line[].case': 'Loads: line load #, case',
  'loads.line[].value': 'Loads: line load #, value',
  'loads.point[].case': 'Loads: point load #, case',
  'loads.point[].value': 'Loads: point load #, value',
  'loads.point[].at': 'Loads: point load #, distance from the root',
  'deflectionLimits.live': 'Limits: live-load deflection, span over',
  'deflectionLimits.total': 'Limits: total-load deflection, span over',
  frequencyMin: 'Limits: lowest acceptable frequency',
  'connection.arrangement': 'Support: arrangement',
  'connection.footprint.shape': 'Support: section on the plate',
  'connection.plate.N': 'Support: plate length N',
  'connection.plate.B': 'Support: plate width B',
  'connection.plate.thickness': 'Support: plate thickness',
  'connection.plate.Fy': 'Support: plate yield stress Fy',
  'connection.anchors.perSide': 'Support: rods in each row',
  'connection.anchors.diameter': 'Support: rod diameter',
  'connection.anchors.grade': 'Support: rod grade',
  'connection.anchors.offset': 'Support: plate centre to rod row',
  'connection.anchors.gauge': 'Support: rod spacing in a row',
  'connection.anchors.embedment': 'Support: rod embedment',
  'connection.concrete.fc': "Support: concrete strength f'c",
  'connection.concrete.cracked': 'Support: concrete taken as cracked',
  'connection.pier.length': 'Support: pier length',
  'connection.pier.width': 'Support: pier width',
};

const GROUPS: Record<string, string> = {
  member: 'Reach',
  loads: 'Loads',
  connection: 'Support',
  deflectionLimits: 'Limits',
};

function words(camel: string): string {
  return camel.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
}

/** A path from diffDesigns in plain words; unknown paths fall back to their group and split names. */
export function pathWords(path: string): string {
  const index = /\[(\d+)\]/.exec(path);
  const generic = path.replace(/\[\d+\]/g, '[]');
  const known = WORDS[generic];
  if (known) return index ? known.replace('#', String(Number(index[1]) + 1)) : known;
  const [head, ...rest] = path.split('.');
  const group = GROUPS[head.replace(/\[\d+\]$/, '')] ?? 'Settings';
  const tail = rest.length ? rest : [head];
  return `${group}: ${tail.map((part) => words(part.replace(/\[(\d+)\]/g, (_m, i: string) => ` ${Number(i) + 1}`))).join(', ')}`;
}

/** A changed value in words; a missing value is "not set". */
export function valueWords(value: string | number | boolean | null): string {
  if (value === null) return 'not set';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return String(value);
}
