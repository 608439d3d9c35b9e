/** Fixed ids of the demo catalog (the spec's own `id` is the same). */
export const DEMO_CATALOG_IDS = {
  engines: {
    kestrel53: '5a0b1c2d-0000-4000-8000-000000000501',
    kestrel62: '5a0b1c2d-0000-4000-8000-000000000502',
    harrow40: '5a0b1c2d-0000-4000-8000-000000000503',
  },
  oilPans: {
    kestrelStockFront: '5a0b1c2d-0000-4000-8000-000000000511',
    kestrelRearSwap: '5a0b1c2d-0000-4000-8000-000000000512',
    kestrelDeepRear: '5a0b1c2d-0000-4000-8000-000000000513',
    kestrelCenterTow: '5a0b1c2d-0000-4000-8000-000000000514',
    harrowStock: '5a0b1c2d-0000-4000-8000-000000000515',
  },
  oilPickups: {
    kestrelFront: '5a0b1c2d-0000-4000-8000-000000000521',
    kestrelRear: '5a0b1c2d-0000-4000-8000-000000000522',
    kestrelCenter: '5a0b1c2d-0000-4000-8000-000000000523',
  },
  oilPumps: {
    kestrelStock: '5a0b1c2d-0000-4000-8000-000000000531',
    kestrelHighVolume: '5a0b1c2d-0000-4000-8000-000000000532',
    harrowStock: '5a0b1c2d-0000-4000-8000-000000000533',
  },
  chassis: {
    ridgeback78: '5a0b1c2d-0000-4000-8000-000000000541',
    stag84: '5a0b1c2d-0000-4000-8000-000000000542',
    tallgrass66: '5a0b1c2d-0000-4000-8000-000000000543',
  },
  transmissions: {
    marlow45: '5a0b1c2d-0000-4000-8000-000000000551',
    marlow65: '5a0b1c2d-0000-4000-8000-000000000552',
    dunmore5: '5a0b1c2d-0000-4000-8000-000000000553',
  },
  controllers: {
    tessaryT8: '5a0b1c2d-0000-4000-8000-000000000561',
    tessaryT6: '5a0b1c2d-0000-4000-8000-000000000562',
    quillStandalone: '5a0b1c2d-0000-4000-8000-000000000563',
  },
  mountAdapters: {
    plates40: '5a0b1c2d-0000-4000-8000-000000000571',
    drop60: '5a0b1c2d-0000-4000-8000-000000000572',
    heavy90: '5a0b1c2d-0000-4000-8000-000000000573',
  },
  bellhousingAdapters: {
    kb1ToDm5: '5a0b1c2d-0000-4000-8000-000000000581',
  },
  belts: {
    sixPk1120: '5a0b1c2d-0000-4000-8000-000000000591',
    sixPk1165: '5a0b1c2d-0000-4000-8000-000000000592',
    sixPk1195: '5a0b1c2d-0000-4000-8000-000000000593',
    sixPk1225: '5a0b1c2d-0000-4000-8000-000000000594',
    sixPk1260: '5a0b1c2d-0000-4000-8000-000000000595',
    fivePk1223: '5a0b1c2d-0000-4000-8000-000000000596',
  },
} as const;
