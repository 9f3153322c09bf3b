/**
 * Design-document paths in plain words, for every place a person reads a field's name (the desk's
 * problem list and save dialog, the conflict dialog, Compare, Review, the package): "member.length"
 * → "Reach: length, root to tip". Groups follow the design desk (Reach, Section, Loads, Support,
 * Limits, Settings). The path itself stays in API responses and CLI output.
 */
const WORDS: Record<string, string> = {
  '(document)': 'The whole design document',
  units: 'Settings: result units',
  method: 'Settings: design method (LRFD or ASD)',
  member: 'Reach: the member',
  'member.length': 'Reach: length, root to tip',
  'member.spacing': 'Reach: spacing',
  'member.unbracedLength': 'Reach: unbraced length of the bottom flange',
  'member.lateralSupport': 'Reach: lateral support',
  'member.lateralSupport.topFlange': 'Reach: top flange bracing',
  'member.lateralSupport.loadAt': 'Reach: gravity load applied at',
  'member.lateralSupport.root': 'Reach: root restraint',
  'member.lateralSupport.tip': 'Reach: tip bracing',
  'member.lateralSupport.braces': 'Reach: bottom-flange braces',
  'member.lateralSupport.braces[]': 'Reach: brace #, distance from the root',
  'member.lateralSupport.effectiveLengthFactor': 'Reach: effective-length factor K, free-tip segment',
  'member.section': 'Section: the section',
  'member.section.shape': 'Section: shape',
  'member.section.tipDepth': 'Section: depth at the tip (tapered web)',
  'member.section.plates': 'Section: built-up plates',
  'member.section.plates.rootDepth': 'Section: built-up depth at the root',
  'member.section.plates.tipDepth': 'Section: built-up depth at the tip',
  'member.section.plates.flangeWidth': 'Section: built-up flange width',
  'member.section.plates.flangeThickness': 'Section: built-up flange thickness',
  'member.section.plates.webThickness': 'Section: built-up web thickness',
  'member.steel': 'Section: steel',
  'member.steel.Fy': 'Section: steel yield stress Fy',
  'member.steel.E': 'Section: steel modulus E',
  loads: 'Loads: the loads',
  'loads.selfWeight': 'Loads: self-weight included',
  'loads.area': 'Loads: area loads',
  'loads.line': 'Loads: line loads',
  'loads.point': 'Loads: point loads',
  'loads.area[]': 'Loads: area load #',
  'loads.line[]': 'Loads: line load #',
  'loads.point[]': 'Loads: point load #',
  'loads.area[].case': 'Loads: area load #, case',
  'loads.area[].value': 'Loads: area load #, value',
  'loads.line[].case': 'Loads: line load #, case',
  'loads.line[].value': 'Loads: line load #, value',
  'loads.point[].case': 'Loads: point load #, case',
  'loads.point[].value': 'Loads: point load #, force',
  'loads.point[].at': 'Loads: point load #, distance from the root',
  'loads.seismic': 'Loads: seismic data',
  'loads.seismic.SDS': 'Loads: seismic SDS, in g',
  'loads.seismic.category': 'Loads: seismic design category',
  deflectionLimits: 'Limits: deflection limits',
  'deflectionLimits.live': 'Limits: live-load deflection, span over',
  'deflectionLimits.total': 'Limits: total-load deflection, span over',
  frequencyMin: 'Limits: lowest acceptable frequency',
  connection: 'Support: the connection',
  'connection.arrangement': 'Support: arrangement',
  'connection.footprint': 'Support: footprint on the plate',
  'connection.footprint.shape': 'Support: section on the plate',
  'connection.plate': 'Support: base plate',
  'connection.plate.N': 'Support: plate length N',
  'connection.plate.B': 'Support: plate width B',
  'connection.plate.thickness': 'Support: plate thickness',
  'connection.plate.Fy': 'Support: plate yield stress Fy',
  'connection.anchors': 'Support: anchor rods',
  'connection.anchors.perSide': 'Support: rods in each row',
  'connection.anchors.diameter': 'Support: rod diameter',
  'connection.anchors.grade': 'Support: rod grade',
  'connection.anchors.offset': 'Support: plate centre to rod row',
  'connection.anchors.gauge': 'Support: rod spacing in a row',
  'connection.anchors.embedment': 'Support: rod embedment',
  'connection.anchors.supplementaryReinforcement': 'Support: supplementary reinforcement around the rods',
  'connection.anchors.torqued': 'Support: rods pretensioned by torque',
  'connection.concrete': 'Support: concrete',
  'connection.concrete.fc': "Support: concrete strength f'c",
  'connection.concrete.cracked': 'Support: concrete taken as cracked',
  'connection.concrete.lambda': 'Support: lightweight-concrete factor',
  'connection.pier': 'Support: pier',
  'connection.pier.length': 'Support: pier length',
  'connection.pier.width': 'Support: pier width',
  'connection.pier.depth': 'Support: pier depth along the rods',
  'connection.post': 'Support: post',
  'connection.post.height': 'Support: post height',
  'connection.weld': 'Support: fillet weld',
  'connection.weld.size': 'Support: fillet weld size',
  'connection.weld.electrode': 'Support: weld electrode',
  'connection.flexibleRoot': 'Support: root rotates with the connection',
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

/** Every path the map knows (the tests hold it to the design schema). */
export const KNOWN_PATHS: readonly string[] = Object.keys(WORDS);

/** The group a path's words start with ("Reach", "Loads", …). */
export function pathGroup(path: string): string {
  return pathWords(path).split(':')[0];
}

/**
 * A path as the engine, the API or diffDesigns write it ("loads.area[0].value", dotted form
 * "loads.area.0.value" too) in plain words; an unknown path falls back to its group and split names.
 */
export function pathWords(fieldPath: string): string {
  // API issues of a revision save name the body's field: "input.member.length".
  const path = fieldPath.replace(/^input\./, '').replace(/\.(\d+)(?=\.|$)/g, '[$1]') || '(document)';
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
