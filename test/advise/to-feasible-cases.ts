/**
 * Invented duties (settings of our own) where options fail, for the "what it would take" tests.
 * Each names what it is there to show.
 */
export const FAILING_CASES = {
  /** Every option fails: a named rubbing material too weak, the housing a little too small for a rolling bearing. */
  tightPivot: {
    title: 'Tipping-table pivot of a bottle sorter, greased (invented)',
    shaft: { diameter: '40 mm', speed: '60 rpm' },
    load: { radial: '6 kN' },
    life: { hours: '5000 h' },
    space: { maxLength: '60 mm', maxOuterDiameter: '60 mm' },
    lubrication: { supply: 'grease' },
    bushing: { material: 'ptfe-lined-steel' },
  },
  /** A named rubbing material that wears through too soon where a sintered bearing would last. */
  namedNylon: {
    title: 'Damper-blade linkage of a drying kiln, dry running (invented)',
    shaft: { diameter: '30 mm', speed: '100 rpm' },
    load: { radial: '400 N' },
    life: { hours: '3000 h' },
    space: { maxLength: '40 mm', maxOuterDiameter: '45 mm' },
    lubrication: { supply: 'none' },
    environment: { ambient: '80 degC' },
    bushing: { material: 'nylon' },
  },
  /** A rolling bearing sealed for life whose grease gives out long before the life target. */
  sealedFan: {
    title: 'Extract fan of a drying oven, sealed bearings (invented)',
    shaft: { diameter: '40 mm', speed: '3600 rpm' },
    load: { radial: '1 kN' },
    life: { hours: '60000 h' },
    space: { maxLength: '40 mm', maxOuterDiameter: '100 mm' },
    lubrication: { supply: 'none' },
    environment: { ambient: '50 degC' },
  },
  /** A rolling bearing too fast for grease, its life ample. */
  fastSpindle: {
    title: 'Grinding-wheel dresser spindle on grease (invented)',
    shaft: { diameter: '50 mm', speed: '9000 rpm' },
    load: { radial: '300 N' },
    life: { hours: '40000 h' },
    space: { maxLength: '40 mm', maxOuterDiameter: '110 mm' },
    lubrication: { supply: 'grease' },
    environment: { ambient: '40 degC' },
  },
  /** A journal bearing on grease: only an oil supply can make it work. */
  greasedFan: {
    title: 'Cooling-tower fan jackshaft, greased (invented)',
    shaft: { diameter: '50 mm', speed: '3000 rpm' },
    load: { radial: '2 kN' },
    life: { hours: '20000 h' },
    space: { maxLength: '60 mm', maxOuterDiameter: '100 mm' },
    lubrication: { supply: 'grease' },
  },
  /** An open bearing on grease whose maintenance plan regreases less often than it needs. */
  regreasePlan: {
    title: 'Drive-end bearing of a flour-mill roller, regreased on a plan (invented)',
    shaft: { diameter: '45 mm', speed: '3000 rpm' },
    load: { radial: '1.5 kN' },
    life: { hours: '30000 h' },
    space: { maxLength: '40 mm', maxOuterDiameter: '120 mm' },
    lubrication: { supply: 'grease', regreaseInterval: '4000 h' },
    environment: { ambient: '60 degC' },
  },
  /** A rolling bearing restricted to a light series too weak for its life, where a heavier series fits. */
  lightSeries: {
    title: 'Tail pulley of a ballast conveyor, light series named (invented)',
    shaft: { diameter: '50 mm', speed: '300 rpm' },
    load: { radial: '6 kN', shock: 'light' },
    life: { hours: '40000 h' },
    space: { maxLength: '40 mm', maxOuterDiameter: '130 mm' },
    lubrication: { supply: 'grease' },
    rolling: { kind: 'deep-groove ball', series: '10' },
  },
};
