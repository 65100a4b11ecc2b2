import { createTestApp, makeTeam, makeUser, signedIn } from './test-app';

let ctx: Awaited<ReturnType<typeof createTestApp>>;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let designer: Agent;
let reviewer: Agent;
let outsider: Agent;
let teamId: number;

beforeAll(async () => {
  ctx = await createTestApp();
  teamId = (await makeTeam(ctx.db, 'Sinks')).id;
  const other = await makeTeam(ctx.db, 'Elsewhere');
  await makeUser(ctx.db, 'd@sinks.test', [{ teamId, role: 'designer' }]);
  await makeUser(ctx.db, 'r@sinks.test', [{ teamId, role: 'reviewer' }]);
  await makeUser(ctx.db, 'o@else.test', [{ teamId: other.id, role: 'owner' }]);
  designer = await signedIn(ctx.app, 'd@sinks.test');
  reviewer = await signedIn(ctx.app, 'r@sinks.test');
  outsider = await signedIn(ctx.app, 'o@else.test');
});
afterAll(() => ctx.close());

const csv = (text: string) => Buffer.from(text, 'utf8');
const importCsv = (agent: Agent, text: string | Buffer, mapping: object) =>
  agent
    .post('/api/heatsinks/import')
    .field('mapping', JSON.stringify(mapping))
    .attach('file', typeof text === 'string' ? csv(text) : text, { filename: 'sinks.csv', contentType: 'text/csv' });

describe('heatsink catalogue', () => {
  it('lets a designer add a sink, a reviewer read it, and hides it from other teams', async () => {
    const created = await designer.post('/api/heatsinks').send({ name: 'Fin block 100', rthKPerW: 1.1, massKg: 0.3, material: 'aluminium', forcedAir: [{ airSpeedMPerS: 2, rthKPerW: 0.45 }] });
    expect(created.status).toBe(201);
    expect(created.body.item).toMatchObject({ name: 'Fin block 100', referenceRiseK: 75, devicesPerSink: 1, teamId });
    const id = created.body.item.id;
    expect((await reviewer.get(`/api/heatsinks/${id}`)).status).toBe(200);
    expect((await reviewer.put(`/api/heatsinks/${id}`).send({ name: 'x', rthKPerW: 1 })).status).toBe(403);
    expect((await reviewer.post('/api/heatsinks').send({ name: 'x', rthKPerW: 1 })).status).toBe(403);
    expect((await outsider.get(`/api/heatsinks/${id}`)).status).toBe(404);
    expect((await outsider.get('/api/heatsinks')).body.items).toEqual([]);
  });

  it('records edits in the team activity log', async () => {
    const created = await designer.post('/api/heatsinks').send({ name: 'Logged sink', rthKPerW: 2 });
    const edited = await designer.put(`/api/heatsinks/${created.body.item.id}`).send({ name: 'Logged sink, longer', rthKPerW: 1.8 });
    expect(edited.status).toBe(200);
    const events = await ctx.db.models.AuditEvent.findAll({ where: { subjectId: created.body.item.id }, order: [['id', 'ASC']] });
    expect(events.map((e) => e.action)).toEqual(['heatsink.created', 'heatsink.updated']);
  });

  it('answers 400 naming each bad field', async () => {
    const res = await designer.post('/api/heatsinks').send({ name: '', rthKPerW: -2, material: 'steel', forcedAir: [{ airSpeedMPerS: 0, rthKPerW: 1 }] });
    expect(res.status).toBe(400);
    const paths = res.body.error.details.map((d: { path: string }) => d.path).sort();
    expect(paths).toEqual(['forcedAir[0].airSpeedMPerS', 'material', 'name', 'rthKPerW']);
  });
});

describe('CSV import', () => {
  const header = 'Part,Rsa (°C/W),Mass (g),Width (mm),Length (mm),Price\n';

  it('previews columns and first rows, and suggests a unit-aware mapping from the header', async () => {
    const res = await designer.post('/api/heatsinks/import/preview').attach('file', csv(header + 'A1,2.5,120,50,75,3.20\n'), 'a.csv');
    expect(res.status).toBe(200);
    expect(res.body.columns).toEqual(['Part', 'Rsa (°C/W)', 'Mass (g)', 'Width (mm)', 'Length (mm)', 'Price']);
    expect(res.body.firstRows).toEqual([['A1', '2.5', '120', '50', '75', '3.20']]);
    expect(res.body.suggestedMapping).toMatchObject({
      name: { column: 'Part' },
      rthKPerW: { column: 'Rsa (°C/W)', unit: '°C/W' },
      massKg: { column: 'Mass (g)', unit: 'g' },
      widthMm: { column: 'Width (mm)', unit: 'mm' },
      price: { column: 'Price' },
    });
  });

  it('imports 200 rows in one go, converting units (120 g → 0.12 kg, 5 cm → 50 mm)', async () => {
    const rows = Array.from({ length: 200 }, (_, i) => `Bulk ${i},${(1 + i / 100).toFixed(2)},120,5 cm,75,${i}`).join('\n');
    const mapping = { name: { column: 'Part' }, rthKPerW: { column: 'Rsa (°C/W)' }, massKg: { column: 'Mass (g)', unit: 'g' }, widthMm: { column: 'Width (mm)', unit: 'mm' }, lengthMm: { column: 'Length (mm)', unit: 'mm' }, price: { column: 'Price' } };
    const res = await importCsv(designer, header + rows, mapping);
    expect(res.body.error).toBeUndefined();
    expect(res.status).toBe(201);
    expect(res.body.imported).toBe(200);
    const one = await ctx.db.models.Heatsink.findOne({ where: { name: 'Bulk 7' } });
    expect(one!.massKg).toBeCloseTo(0.12, 12);
    expect(one!.widthMm).toBeCloseTo(50, 9);
    expect(one!.rthKPerW).toBeCloseTo(1.07, 12);
  });

  it('saves nothing when any row is wrong, and names every bad row and column', async () => {
    const before = await ctx.db.models.Heatsink.count();
    const text = header + 'Good,2.0,100,40,50,1\nBad unit,2 V,100,40,50,1\n,3.0,abc,40,50,1\nNeg,-1,100,40,50,1\n';
    const mapping = { name: { column: 'Part' }, rthKPerW: { column: 'Rsa (°C/W)' }, massKg: { column: 'Mass (g)', unit: 'g' } };
    const res = await importCsv(designer, text, mapping);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('import_failed');
    const found = res.body.error.details.map((d: { row: number; column: string }) => `${d.row}:${d.column}`).sort();
    expect(found).toEqual(['3:Rsa (°C/W)', '4:Mass (g)', '4:Part', '5:Rsa (°C/W)']);
    expect(await ctx.db.models.Heatsink.count()).toBe(before);
  });

  it('refuses ragged rows, non-UTF-8 text, binary files, empty files and a missing mapping', async () => {
    const mapping = { name: { column: 'Part' }, rthKPerW: { column: 'Rsa (°C/W)' } };
    const ragged = await importCsv(designer, header + 'A,1,2\n', mapping);
    expect(ragged.status).toBe(400);
    expect(ragged.body.error.details[0]).toMatchObject({ row: 2, message: 'has 3 cells but the header has 6' });

    const latin1 = Buffer.concat([csv('Part,Rsa\n'), Buffer.from([0x4b, 0xfc, 0x68, 0x6c]), csv(',1\n')]);
    expect((await importCsv(designer, latin1, mapping)).body.error.message).toMatch(/not UTF-8/);

    const binary = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x00, 0x01]);
    expect((await importCsv(designer, binary, mapping)).body.error.message).toMatch(/not text/);

    expect((await importCsv(designer, '', mapping)).status).toBe(400);
    const noMapping = await designer.post('/api/heatsinks/import').attach('file', csv(header + 'A,1,1,1,1,1\n'), 'a.csv');
    expect(noMapping.body.error.details[0].path).toBe('mapping');
  });

  it('reads semicolon-separated files with decimal commas', async () => {
    const res = await importCsv(designer, 'Part;Rsa\nSemi;1,75\n', { name: { column: 'Part' }, rthKPerW: { column: 'Rsa' } });
    expect(res.status).toBe(201);
    expect((await ctx.db.models.Heatsink.findOne({ where: { name: 'Semi' } }))!.rthKPerW).toBe(1.75);
  });

  it('refuses files over the size limit with 413', async () => {
    const big = Buffer.alloc(1024 * 1024 + 10, 'a');
    const res = await importCsv(designer, big, {});
    expect(res.status).toBe(413);
  });

  it('is closed to reviewers', async () => {
    const res = await importCsv(reviewer, header + 'A,1,1,1,1,1\n', { name: { column: 'Part' }, rthKPerW: { column: 'Rsa (°C/W)' } });
    expect(res.status).toBe(403);
  });
});

describe('CSV export', () => {
  it('writes every sink with forced-air columns, escapes formula-like text, and imports back', async () => {
    await designer.post('/api/heatsinks').send({ name: '=HYPERLINK("x")', rthKPerW: 3.3, forcedAir: [{ airSpeedMPerS: 1, rthKPerW: 1.9 }] });
    const res = await designer.get(`/api/heatsinks/export.csv?teamId=${teamId}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toMatch(/^name,description,rth_k_per_w,reference_rise_k,.*rth_k_per_w_at_1_m_s/);
    expect(res.text).toContain(`"'=HYPERLINK(""x"")"`);

    const preview = await designer.post('/api/heatsinks/import/preview').attach('file', Buffer.from(res.text), 'back.csv');
    expect(preview.body.suggestedMapping.forcedAir).toEqual(expect.arrayContaining([{ column: 'rth_k_per_w_at_1_m_s', airSpeedMPerS: 1 }]));
  });
});

describe('convection exponent', () => {
  it('stores n, shows null as the default, and refuses n outside 0…1 naming the field', async () => {
    const set = await designer.post('/api/heatsinks').send({ name: 'Radiating plate', rthKPerW: 2.4, convectionExponent: 1 / 3 });
    expect(set.status).toBe(201);
    expect(set.body.item.convectionExponent).toBeCloseTo(1 / 3, 12);
    const unset = await designer.post('/api/heatsinks').send({ name: 'Plain extrusion', rthKPerW: 2.4 });
    expect(unset.body.item.convectionExponent).toBeNull();
    const cleared = await designer.put(`/api/heatsinks/${set.body.item.id}`).send({ name: 'Radiating plate', rthKPerW: 2.4, convectionExponent: null });
    expect(cleared.body.item.convectionExponent).toBeNull();

    // The core's range for a natural-convection exponent is 0…1 (checkRange in candidate.ts).
    for (const bad of [1.5, -0.1]) {
      const res = await designer.post('/api/heatsinks').send({ name: 'Bad n', rthKPerW: 2, convectionExponent: bad });
      expect(res.status).toBe(400);
      expect(res.body.error.details).toEqual([{ path: 'convectionExponent', message: expect.stringContaining('0…1') }]);
    }
    const text = await designer.post('/api/heatsinks').send({ name: 'Bad n', rthKPerW: 2, convectionExponent: '0.3' });
    expect(text.body.error.details[0].path).toBe('convectionExponent');
  });

  it('maps an "n" or "exponent" column, imports blank cells as the default, and names the row and field of a bad one', async () => {
    const preview = await designer.post('/api/heatsinks/import/preview').attach('file', csv('Part,Rsa (K/W),n\nA,2,0.3\n'), 'n.csv');
    expect(preview.body.suggestedMapping.convectionExponent).toEqual({ column: 'n' });
    const alias = await designer.post('/api/heatsinks/import/preview').attach('file', csv('Part,Rsa (K/W),Exponent\nA,2,0.3\n'), 'e.csv');
    expect(alias.body.suggestedMapping.convectionExponent).toEqual({ column: 'Exponent' });

    const mapping = { name: { column: 'Part' }, rthKPerW: { column: 'Rsa (K/W)' }, convectionExponent: { column: 'n' } };
    const before = await ctx.db.models.Heatsink.count();
    const bad = await importCsv(designer, 'Part,Rsa (K/W),n\nN fine,2,0.3\nN too big,2,1.4\nN text,2,quarter\n', mapping);
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('import_failed');
    expect(bad.body.error.details).toEqual([
      expect.objectContaining({ row: 3, column: 'n', message: expect.stringMatching(/^Convection exponent must lie in 0…1/) }),
      expect.objectContaining({ row: 4, column: 'n', message: '"quarter" is not a number' }),
    ]);
    expect(await ctx.db.models.Heatsink.count()).toBe(before);

    const good = await importCsv(designer, 'Part,Rsa (K/W),n\nN third,2,0.333\nN blank,2,\n', mapping);
    expect(good.status).toBe(201);
    expect((await ctx.db.models.Heatsink.findOne({ where: { name: 'N third' } }))!.convectionExponent).toBe(0.333);
    expect((await ctx.db.models.Heatsink.findOne({ where: { name: 'N blank' } }))!.convectionExponent).toBeNull();
  });

  it('exports a convection_exponent column that the import maps back', async () => {
    const res = await designer.get(`/api/heatsinks/export.csv?teamId=${teamId}`);
    const lines = res.text.split('\r\n');
    const headers = lines[0].split(',');
    expect(headers.slice(0, 5)).toEqual(['name', 'description', 'rth_k_per_w', 'reference_rise_k', 'convection_exponent']);
    const third = lines.find((l) => l.startsWith('N third,'))!.split(',');
    const blank = lines.find((l) => l.startsWith('N blank,'))!.split(',');
    expect(third[4]).toBe('0.333');
    expect(blank[4]).toBe('');
    const preview = await designer.post('/api/heatsinks/import/preview').attach('file', Buffer.from(res.text), 'back.csv');
    expect(preview.body.suggestedMapping.convectionExponent).toEqual({ column: 'convection_exponent' });
  });
});
