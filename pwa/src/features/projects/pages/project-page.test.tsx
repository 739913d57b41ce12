import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { installFakeApi, json, type FakeApi } from '../../../test/fake-api';
import { renderApp, signedInAs } from '../../../test/render-app';

const project = {
  id: 'p9',
  name: 'Kestle Vale bus survey',
  topic: 'Bus timetable changes',
  fieldStart: '2027-01-11',
  fieldEnd: '2027-01-31',
  targetSize: 400,
  status: 'setup',
  headlineQuestion: 'Would you use an hourly evening bus?',
};

const people = [
  { id: 'u1', name: 'Alys Fenwick', email: 'a@x', role: 'interviewer', createdAt: '2026-01-01' },
  { id: 'u2', name: 'Rhea Quillon', email: 's@x', role: 'supervisor', createdAt: '2026-01-01' },
  { id: 'u3', name: 'Vellmoor Transit Board', email: 'c@x', role: 'client', createdAt: '2026-01-01' },
];

const qualityDefaults = {
  tooShort: { enabled: true, fractionOfMedian: 1 / 3, minimumMinutes: null },
  overlapping: { enabled: true },
  outOfHours: { enabled: true, from: '08:00', to: '21:00' },
  bursts: { enabled: true, perHour: 4 },
  interviewerAnswers: { enabled: true, minimumCompletes: 20, falseDiscoveryRate: 0.1 },
  backChecks: { enabled: true, share: 0.1, raiseAfterNotConfirmed: 0.1, keepReferenceDays: 30 },
};

function projectApi(status = 'setup'): FakeApi {
  const api = installFakeApi();
  api.on('GET', '/api/projects/p9', () => json({ ...project, status }));
  api.on('GET', '/api/projects/p9/targets', () => json({ variables: [] }));
  api.on('GET', '/api/projects/p9/cells', () => json({ variables: [], cells: [], refreshedAt: '2026-12-02T10:00:00Z' }));
  api.on('GET', '/api/projects/p9/members', () => json([]));
  api.on('GET', '/api/users', () => json(people));
  api.on('GET', '/api/projects/p9/quality-settings', () => json({ settings: qualityDefaults, defaults: qualityDefaults, checkedAt: null }));
  api.on('POST', '/api/projects/p9/targets/preview', () => json({ cells: previewCells }));
  return api;
}

const previewCells = [
  { id: 'n1', kind: 'margin', label: 'age_band: 18-34', categoryIds: ['a1'], target: 120, achieved: 0, status: 'open' },
  { id: 'n2', kind: 'margin', label: 'age_band: 35+', categoryIds: ['a2'], target: 280, achieved: 0, status: 'open' },
];

/** Saving shows every cell target first; this goes ahead from there. */
async function confirmCells(user: ReturnType<typeof userEvent.setup>) {
  const dialog = await screen.findByRole('dialog', { name: 'Check the cell targets' });
  await user.click(within(dialog).getByRole('button', { name: 'Save these targets' }));
}

const csv = () => new File(['variable,category,share\nage_band,18-34,30\n'], 'targets.csv', { type: 'text/csv' });

describe('quota targets from a CSV file', () => {
  it("shows the server's reason with its line and saves nothing", async () => {
    const api = projectApi();
    api.on('POST', '/api/projects/p9/targets/parse', () =>
      json({ statusCode: 400, message: 'targets.csv line 4: share "abc" is not a number', fields: [{ field: 'file', message: 'x' }] }, 400),
    );
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.upload(await screen.findByLabelText('Targets file (CSV: variable,category,share)'), csv());
    await user.click(screen.getByRole('button', { name: 'Read file' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The file was not read, and nothing changed');
    expect(alert).toHaveTextContent('targets.csv line 4: share "abc" is not a number');
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);
  });

  it('loads the file into the form for review, then saves it with the chosen interlock and shows the cells', async () => {
    const api = projectApi('fieldwork');
    api.on('POST', '/api/projects/p9/targets/parse', () =>
      json({
        variables: [
          { name: 'age_band', interlocked: false, categories: [{ label: '18-34', share: 30 }, { label: '35+', share: 70 }] },
          { name: 'sex', interlocked: false, categories: [{ label: 'female', share: 51 }, { label: 'male', share: 49 }] },
        ],
      }),
    );
    api.on('PUT', '/api/projects/p9/targets', ({ body }) => {
      api.on('GET', '/api/projects/p9/cells', () =>
        json({
          variables: [],
          refreshedAt: '2026-12-02T10:00:00Z',
          cells: [
            { id: 'c1', kind: 'interlocked', label: 'age_band: 18-34 × sex: female', target: 61, achieved: 0, status: 'open' },
            { id: 'c2', kind: 'interlocked', label: 'age_band: 18-34 × sex: male', target: 59, achieved: 0, status: 'open' },
          ],
        }),
      );
      return json(body);
    });
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    expect(await screen.findByText(/Fieldwork has started\. Saving new targets recomputes the cells; every interview already logged is kept/)).toBeInTheDocument();
    await user.upload(screen.getByLabelText('Targets file (CSV: variable,category,share)'), csv());
    await user.click(screen.getByRole('button', { name: 'Read file' }));

    expect(await screen.findByText(/Read from targets\.csv: 2 variables\. Nothing is saved yet/)).toBeInTheDocument();
    expect(screen.getByLabelText('sex: share of female')).toHaveValue('51');
    expect(screen.getByText(/Total of age_band:/)).toHaveTextContent('100.00');
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);

    await user.click(screen.getByLabelText('Interlock age_band'));
    await user.click(screen.getByLabelText('Interlock sex'));
    expect(screen.getByText('Interlocked set: age_band × sex; every other variable is a margin quota.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    await confirmCells(user);

    const cells = await screen.findByRole('table', { name: 'Cell targets' });
    expect(within(cells).getByRole('row', { name: /18-34 × sex: female/ })).toHaveTextContent('61');
    // The same words as the interviewer's cells page (pwa/src/lib/glossary.ts).
    expect(within(cells).getByRole('row', { name: /18-34 × sex: female/ })).toHaveTextContent('Interlocked cell');
    const put = api.calls.find((c) => c.method === 'PUT');
    expect(put?.body).toEqual({
      variables: [
        { name: 'age_band', columnName: 'age_band', interlocked: true, categories: [{ label: '18-34', share: 30 }, { label: '35+', share: 70 }] },
        { name: 'sex', columnName: 'sex', interlocked: true, categories: [{ label: 'female', share: 51 }, { label: 'male', share: 49 }] },
      ],
    });
    // Without joint shares the page says the cells are the product of the margins.
    expect(screen.getByRole('note', { name: 'Cell targets of interlocked variables' })).toHaveTextContent(
      /Cell targets for age_band × sex are the product of their margins, as if these variables were independent/,
    );
  });

  it('keeps the joint shares a file gives, says the cells come from them, and sends them with the targets', async () => {
    const api = projectApi();
    const jointShares = [
      { categories: ['18-34', 'female'], share: 0.16 }, { categories: ['18-34', 'male'], share: 0.14 },
      { categories: ['35+', 'female'], share: 0.35 }, { categories: ['35+', 'male'], share: 0.35 },
    ];
    api.on('POST', '/api/projects/p9/targets/parse', () =>
      json({
        variables: [
          { name: 'age_band', interlocked: true, categories: [{ label: '18-34', share: 0.3 }, { label: '35+', share: 0.7 }] },
          { name: 'sex', interlocked: true, categories: [{ label: 'female', share: 0.51 }, { label: 'male', share: 0.49 }] },
        ],
        jointShares,
      }),
    );
    api.on('PUT', '/api/projects/p9/targets', ({ body }) => json({ ...(body as object), interlockBasis: 'joint shares' }));
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.upload(await screen.findByLabelText('Targets file (CSV: variable,category,share)'), csv());
    await user.click(screen.getByRole('button', { name: 'Read file' }));
    const note = await screen.findByRole('note', { name: 'Cell targets of interlocked variables' });
    expect(note).toHaveTextContent('Cell targets for age_band × sex come from their joint shares (4 combinations, read from targets.csv)');

    // Unticking one of the table's variables would orphan the table: refused before anything is sent.
    await user.click(screen.getByLabelText('Interlock sex'));
    await user.click(screen.getByLabelText('Interlock age_band'));
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The joint shares are for age_band × sex: interlock exactly those');
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);

    await user.click(screen.getByLabelText('Interlock age_band'));
    await user.click(screen.getByLabelText('Interlock sex'));
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    await confirmCells(user);
    expect(await screen.findByText(/Targets saved/)).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'PUT')?.body).toMatchObject({ jointShares });
  });
});

describe('a targets file too large to send', () => {
  it('says so on the device, naming the limit, and sends nothing', async () => {
    const api = projectApi();
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();
    const big = new File(['x'.repeat(300 * 1024)], 'census.csv', { type: 'text/csv' });
    await user.upload(await screen.findByLabelText('Targets file (CSV: variable,category,share)'), big);
    expect(await screen.findByRole('alert')).toHaveTextContent('census.csv is 300 KB; a targets file may be at most 256 KB. Nothing was sent.');
    expect(screen.getByRole('button', { name: 'Read file' })).toBeDisabled();
    expect(api.calls.some((c) => c.method === 'POST')).toBe(false);
  });
});

describe('one scale for shares', () => {
  it('shows a file in proportions as percentages, and asks before saving shares that do not add up to 100', async () => {
    const api = projectApi();
    api.on('POST', '/api/projects/p9/targets/parse', () =>
      json({ variables: [{ name: 'age_band', interlocked: false, categories: [{ label: '18-34', share: 0.3 }, { label: '35+', share: 0.7 }] }] }),
    );
    api.on('PUT', '/api/projects/p9/targets', ({ body }) => json(body));
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.upload(await screen.findByLabelText('Targets file (CSV: variable,category,share)'), csv());
    await user.click(screen.getByRole('button', { name: 'Read file' }));
    expect(await screen.findByText(/Read from targets\.csv: 1 variable\./)).toBeInTheDocument();
    expect(screen.getByLabelText('age_band: share of 18-34')).toHaveValue('30');
    expect(screen.getByLabelText('age_band: share of 35+')).toHaveValue('70');

    const young = screen.getByLabelText('age_band: share of 18-34');
    await user.clear(young);
    await user.type(young, '45');
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    const dialog = screen.getByRole('dialog', { name: 'Shares do not add up to 100%' });
    expect(dialog).toHaveTextContent('age_band: 115.00');
    await user.click(within(dialog).getByRole('button', { name: 'Go back' }));
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);

    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    await user.click(within(screen.getByRole('dialog', { name: 'Shares do not add up to 100%' })).getByRole('button', { name: 'Save scaled to 100%' }));
    await confirmCells(user);
    expect(await screen.findByText(/Targets saved/)).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'PUT')?.body).toMatchObject({
      variables: [{ name: 'age_band', categories: [{ label: '18-34', share: 45 }, { label: '35+', share: 70 }] }],
    });
  });
});

describe('every cell target before saving', () => {
  it('shows each cell beside its target now and the interviews in it; Go back saves nothing', async () => {
    const api = projectApi('fieldwork');
    api.on('GET', '/api/projects/p9/targets', () =>
      json({ variables: [{ id: 'v1', name: 'age_band', interlocked: false, categories: [{ id: 'a1', label: '18-34', share: 0.3 }, { id: 'a2', label: '35+', share: 0.7 }] }], jointShares: [], interlockBasis: null }),
    );
    api.on('GET', '/api/projects/p9/cells', () =>
      json({ variables: [], refreshedAt: '2026-12-02T10:00:00Z', cells: [
        { id: 'c1', kind: 'margin', label: 'age_band: 18-34', categoryIds: ['a1'], target: 120, achieved: 40, status: 'open' },
        { id: 'c2', kind: 'margin', label: 'age_band: 35+', categoryIds: ['a2'], target: 280, achieved: 150, status: 'open' },
      ] }),
    );
    api.on('POST', '/api/projects/p9/targets/preview', () =>
      json({ cells: [
        { id: 'c1', kind: 'margin', label: 'age_band: 18-34', categoryIds: ['a1'], target: 100, achieved: 40, status: 'open' },
        { id: 'c2', kind: 'margin', label: 'age_band: 35+', categoryIds: ['a2'], target: 300, achieved: 150, status: 'open' },
      ] }),
    );
    api.on('PUT', '/api/projects/p9/targets', ({ body }) => json(body));
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    const young = await screen.findByLabelText('age_band: share of 18-34');
    await user.clear(young);
    await user.type(young, '25');
    const old = screen.getByLabelText('age_band: share of 35+');
    await user.clear(old);
    await user.type(old, '75');
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    const dialog = await screen.findByRole('dialog', { name: 'Check the cell targets' });
    expect(dialog).toHaveTextContent('2 cells sharing a sample of 400; 2 targets change.');
    const table = within(dialog).getByRole('table', { name: 'New cell targets' });
    expect(within(table).getByRole('row', { name: /18-34/ })).toHaveTextContent(/120\s*100\s*40/);
    expect(within(table).getByRole('row', { name: /35\+/ })).toHaveTextContent(/280\s*300\s*150/);
    expect(api.calls.find((c) => c.method === 'POST' && c.path.endsWith('/preview'))?.body).toMatchObject({
      variables: [{ name: 'age_band', categories: [{ label: '18-34', share: 25 }, { label: '35+', share: 75 }] }],
    });
    await user.click(within(dialog).getByRole('button', { name: 'Go back' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);
  });

  it('takes proportions, 30% and census counts without asking; a slip between scales asks', async () => {
    const api = projectApi();
    api.on('PUT', '/api/projects/p9/targets', ({ body }) => json(body));
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.type(await screen.findByPlaceholderText('e.g. Age band'), 'district');
    await user.type(screen.getByLabelText('district: category 1'), 'Harbour');
    await user.type(screen.getByLabelText('district: category 2'), 'Uplands');
    const cases: [string, string, boolean][] = [
      ['0.3', '0.7', false], // proportions
      ['30%', '70%', false], // percentages with the sign
      ['5400', '12600', false], // census counts
      ['0.35', '70', true], // a proportion typed among percentages
    ];
    for (const [a, b, asks] of cases) {
      await user.clear(screen.getByLabelText('district: share of Harbour'));
      await user.type(screen.getByLabelText('district: share of Harbour'), a);
      await user.clear(screen.getByLabelText('district: share of Uplands'));
      await user.type(screen.getByLabelText('district: share of Uplands'), b);
      await user.click(screen.getByRole('button', { name: 'Save targets' }));
      const question = screen.queryByRole('dialog', { name: 'Shares do not add up to 100%' });
      expect(question !== null, `${a} and ${b}`).toBe(asks);
      if (question) await user.click(within(question).getByRole('button', { name: 'Go back' }));
      else await user.click(within(await screen.findByRole('dialog', { name: 'Check the cell targets' })).getByRole('button', { name: 'Go back' }));
    }
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);
  });
});

describe('editing targets mid-field', () => {
  const saved = {
    variables: [
      { id: 'v-age', name: 'Age band', columnName: 'age_band', interlocked: false, interviews: 10, categories: [
        { id: 'c-young', label: '18-34', share: 0.3, interviews: 4 }, { id: 'c-old', label: '35+', share: 0.7, interviews: 6 },
      ] },
      { id: 'v-region', name: 'District', columnName: 'district', interlocked: false, interviews: 10, categories: [
        { id: 'c-harbour', label: 'Harbour', share: 0.5, interviews: 7 }, { id: 'c-hill', label: 'Hill', share: 0.3, interviews: 3 }, { id: 'c-new', label: 'Moor', share: 0.2, interviews: 0 },
      ] },
    ],
    jointShares: [],
    interlockBasis: null,
  };

  it('asks before removing a variable, naming the interviews it holds; Keep it changes nothing', async () => {
    const api = projectApi('fieldwork');
    api.on('GET', '/api/projects/p9/targets', () => json(saved));
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Remove District' }));
    const dialog = screen.getByRole('dialog', { name: 'Remove District?' });
    expect(dialog).toHaveTextContent('District holds 10 interviews.');
    expect(dialog).toHaveTextContent('interviews already logged in it are kept, and it is closed for new ones');
    await user.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(screen.getByLabelText('District: share of Harbour')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Remove District' }));
    await user.click(within(screen.getByRole('dialog', { name: 'Remove District?' })).getByRole('button', { name: 'Remove District' }));
    expect(screen.queryByLabelText('District: share of Harbour')).not.toBeInTheDocument();
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);
  });

  it('renames a category as the same category and retires a removed one after saying what happens to its interviews', async () => {
    const api = projectApi('fieldwork');
    api.on('GET', '/api/projects/p9/targets', () => json(saved));
    api.on('PUT', '/api/projects/p9/targets', ({ body }) => json({ ...(body as object), jointShares: [], interlockBasis: null }));
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    const harbour = await screen.findByLabelText('District: category 1');
    await user.clear(harbour);
    await user.type(harbour, 'Harbourside');
    await user.click(screen.getByRole('button', { name: 'Remove Hill from District' }));
    const dialog = screen.getByRole('dialog', { name: 'Remove Hill?' });
    expect(dialog).toHaveTextContent('Hill holds 3 interviews.');
    expect(dialog).toHaveTextContent('left out of weighting unless you merge Hill into another category');
    await user.click(within(dialog).getByRole('button', { name: 'Remove Hill' }));
    await user.click(screen.getByRole('button', { name: 'Save targets' }));
    // Totals are off after the removal: the scaling question comes first, then every cell target.
    await user.click(await screen.findByRole('button', { name: 'Save scaled to 100%' }));
    await confirmCells(user);

    await screen.findByText(/Targets saved/);
    const put = api.calls.find((c) => c.method === 'PUT');
    const district = (put?.body as { variables: { id?: string; categories: { id?: string; label: string }[] }[] }).variables[1]!;
    expect(district.id).toBe('v-region');
    expect(district.categories.map((c) => [c.id, c.label])).toEqual([['c-harbour', 'Harbourside'], ['c-new', 'Moor']]);
  });
});

describe('quota targets typed in', () => {
  it('refuses a lone interlocked variable and a share that is not a number, and sends nothing', async () => {
    const api = projectApi();
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.type(await screen.findByPlaceholderText('e.g. Age band'), 'region');
    await user.type(screen.getByLabelText('region: category 1'), 'Harrowby');
    await user.type(screen.getByLabelText('region: share of Harrowby'), 'lots');
    await user.type(screen.getByLabelText('region: category 2'), 'Mardon');
    await user.type(screen.getByLabelText('region: share of Mardon'), '40');
    await user.click(screen.getByLabelText('Interlock region'));
    await user.click(screen.getByRole('button', { name: 'Save targets' }));

    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent('region: the share of “Harrowby” must be a number.');
    expect(alert).toHaveTextContent('Interlock at least two variables, or none.');
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);
  });
});

describe('the project stage', () => {
  it('asks before starting fieldwork, shows why the server refuses, and moves on once confirmed', async () => {
    const api = projectApi();
    let ready = false;
    api.on('PATCH', '/api/projects/p9', ({ body }) => {
      if (!ready) return json({ statusCode: 400, message: 'Fieldwork cannot start yet: add at least one interviewer to the team.' }, 400);
      // The server now holds the new stage: later reads of the project see it too.
      api.on('GET', '/api/projects/p9', () => json({ ...project, ...(body as object) }));
      return json({ ...project, ...(body as object) });
    });
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Start fieldwork' }));
    const dialog = screen.getByRole('dialog', { name: 'Start fieldwork?' });
    expect(dialog).toHaveTextContent('Interviewers on the team get the cells at their next sync');
    expect(api.calls.some((c) => c.method === 'PATCH')).toBe(false);
    await user.click(within(dialog).getByRole('button', { name: 'Start fieldwork' }));
    expect(await within(dialog).findByText('Fieldwork cannot start yet: add at least one interviewer to the team.')).toBeInTheDocument();

    ready = true;
    await user.click(within(dialog).getByRole('button', { name: 'Start fieldwork' }));
    expect(await screen.findByText('In the field')).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.calls.filter((c) => c.method === 'PATCH').map((c) => c.body)).toEqual([{ status: 'fieldwork' }, { status: 'fieldwork' }]);
  });

  it('says what happens to interviews before moving a project in the field back to set-up, and Cancel changes nothing', async () => {
    const api = projectApi('fieldwork');
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Back to set-up' }));
    const dialog = screen.getByRole('dialog', { name: 'Move the project back to set-up?' });
    expect(dialog).toHaveTextContent('Every interview logged so far is kept and still counts');
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.calls.some((c) => c.method === 'PATCH')).toBe(false);
  });
});

describe('the project details', () => {
  it('changes the sample size and headline question from the project page, saying what a change does', async () => {
    const api = projectApi('fieldwork');
    api.on('PATCH', '/api/projects/p9', ({ body }) => {
      api.on('GET', '/api/projects/p9', () => json({ ...project, status: 'fieldwork', ...(body as object) }));
      return json({ ...project, status: 'fieldwork', ...(body as object) });
    });
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Edit details' }));
    expect(screen.getByText(/A new sample size recomputes the cell targets/)).toBeInTheDocument();
    const size = screen.getByLabelText('Target sample size');
    await user.clear(size);
    await user.type(size, '450');
    const question = screen.getByLabelText('Headline question');
    await user.clear(question);
    await user.type(question, 'Would you use a late bus on Fridays?');
    await user.click(screen.getByRole('button', { name: 'Save details' }));

    expect(await screen.findByText('Details saved.')).toBeInTheDocument();
    expect(screen.getByText('Would you use a late bus on Fridays?')).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'PATCH')?.body).toMatchObject({ targetSize: 450, headlineQuestion: 'Would you use a late bus on Fridays?', name: 'Kestle Vale bus survey' });
  });
});

describe('a new wave', () => {
  it('duplicates the project after asking, and opens the copy', async () => {
    const api = projectApi('closed');
    api.on('POST', '/api/projects/p9/duplicate', () => {
      api.on('GET', '/api/projects/p10', () => json({ ...project, id: 'p10', name: 'Kestle Vale bus survey (copy)' }));
      api.on('GET', '/api/projects/p10/targets', () => json({ variables: [] }));
      api.on('GET', '/api/projects/p10/cells', () => json({ variables: [], cells: [], refreshedAt: '2026-12-02T10:00:00Z' }));
      api.on('GET', '/api/projects/p10/members', () => json([]));
      return json({ ...project, id: 'p10', name: 'Kestle Vale bus survey (copy)' }, 201);
    });
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Duplicate for a new wave' }));
    const dialog = screen.getByRole('dialog', { name: 'Duplicate this project?' });
    expect(dialog).toHaveTextContent('none of this project’s interviews');
    expect(api.calls.some((c) => c.method === 'POST')).toBe(false);
    await user.click(within(dialog).getByRole('button', { name: 'Duplicate' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Kestle Vale bus survey (copy)' })).toBeInTheDocument();
  });
});

describe('the team', () => {
  it("assigns the agency's people by role", async () => {
    const api = projectApi();
    api.on('PUT', '/api/projects/p9/members', ({ body }) =>
      json(people.filter((p) => (body as { userIds: string[] }).userIds.includes(p.id))),
    );
    await signedInAs('lead');
    renderApp('/lead/projects/p9');
    const user = userEvent.setup();

    const interviewers = await screen.findByRole('group', { name: /Interviewers/ });
    await user.click(within(interviewers).getByLabelText('Alys Fenwick'));
    await user.click(within(screen.getByRole('group', { name: /Clients/ })).getByLabelText('Vellmoor Transit Board'));
    await user.click(screen.getByRole('button', { name: 'Save team' }));

    expect(await screen.findByText('Team saved.')).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'PUT')?.body).toEqual({ userIds: ['u1', 'u3'] });
  });
});

describe('a new project', () => {
  it('says what is missing and sends nothing, then creates the project and opens it', async () => {
    const api = projectApi();
    api.on('GET', '/api/projects', () => json([]));
    api.on('POST', '/api/projects', () => json(project, 201));
    await signedInAs('lead');
    renderApp('/lead');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('link', { name: 'New project' }));
    await user.click(await screen.findByRole('button', { name: 'Create project' }));
    expect(screen.getByText('Give the project a name.')).toBeInTheDocument();
    expect(screen.getByText('Enter a whole number of interviews, at least 1.')).toBeInTheDocument();
    expect(api.calls.some((c) => c.method === 'POST')).toBe(false);

    await user.type(screen.getByLabelText('Project name'), 'Kestle Vale bus survey');
    await user.type(screen.getByLabelText('Field start'), '2027-01-11');
    await user.type(screen.getByLabelText('Field end'), '2027-01-31');
    await user.type(screen.getByLabelText('Target sample size'), '400');
    await user.type(screen.getByLabelText('Headline question'), 'Would you use an hourly evening bus?');
    await user.selectOptions(screen.getByLabelText('Time zone'), 'Europe/London');
    await user.click(screen.getByRole('button', { name: 'Create project' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Kestle Vale bus survey' })).toBeInTheDocument();
    expect(window.location.pathname).toBe('/lead/projects/p9');
    expect(api.calls.find((c) => c.method === 'POST')?.body).toEqual({
      name: 'Kestle Vale bus survey',
      fieldStart: '2027-01-11',
      fieldEnd: '2027-01-31',
      targetSize: 400,
      headlineQuestion: 'Would you use an hourly evening bus?',
      timeZone: 'Europe/London',
    });
  });
});
