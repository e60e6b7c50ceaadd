import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { makePart, makeRevision, partId } from '../../../test/parts';

const original = makePart({ id: partId(201), version: 3, description: 'Low-noise dual op amp for preamps.' });
// Meanwhile someone else rewrote the description and corrected the slew rate.
const theirs = makePart({
  ...original,
  version: 4,
  description: 'Their wording.',
  parameters: { ...original.parameters, slewRate: { typ: 15e6, conditions: { supply: 30 } } },
  updatedAt: '2025-02-02T08:30:00.000Z',
});

function patchBodies(fetchMock: ReturnType<typeof stubApi>) {
  return callsTo(fetchMock, 'PATCH', `/api/parts/${original.id}`).map(([, init]) => JSON.parse(String(init?.body)) as Record<string, unknown>);
}

describe('editing a part', () => {
  it('on a version conflict lists what changed meanwhile, keeps what was typed, and saves against the new version', async () => {
    let patches = 0;
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      [`GET /api/parts/${original.id}`]: () => json(200, patches >= 2 ? { ...theirs, version: 5, description: 'My wording.' } : original),
      [`GET /api/parts/${original.id}/revisions`]: () => json(200, { items: [makeRevision({ version: 5 })] }),
      [`PATCH /api/parts/${original.id}`]: () => {
        patches += 1;
        if (patches === 1) {
          return json(409, { error: { code: 'version_conflict', message: 'Someone else saved this part first.' }, current: theirs });
        }
        return json(200, { ...theirs, version: 5, description: 'My wording.' });
      },
    });
    const { router } = renderApp(`/parts/${original.id}/edit`);
    const user = userEvent.setup();

    const description = await screen.findByLabelText('Description');
    await user.clear(description);
    await user.type(description, 'My wording.');
    await user.clear(screen.getByLabelText('Gain-bandwidth typ'));
    await user.type(screen.getByLabelText('Gain-bandwidth typ'), '12');
    expect(screen.getByText('= 12 MHz')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    const panel = await screen.findByTestId('conflict-panel');
    expect(within(panel).getByText('Someone else saved this part while you were editing')).toBeInTheDocument();
    const rows = within(panel).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.getAttribute('data-field'))).toEqual(['description', 'parameters.slewRate']);
    const [descRow, slewRow] = rows;
    expect(within(descRow!).getByText('Their wording.')).toBeInTheDocument();
    expect(within(descRow!).getByText('My wording.')).toBeInTheDocument();
    // Changed on both sides: keep mine by default. Changed only by them: take theirs by default.
    expect(within(descRow!).getByRole('radio', { name: 'Keep mine' })).toBeChecked();
    expect(within(slewRow!).getByRole('radio', { name: 'Take current' })).toBeChecked();
    expect(within(slewRow!).getByText('you did not change this')).toBeInTheDocument();
    expect(within(slewRow!).getByText(/typ 15 V\/µs/)).toBeInTheDocument();
    // Nothing typed is lost.
    expect(screen.getByLabelText('Description')).toHaveValue('My wording.');
    expect(screen.getByLabelText('Gain-bandwidth typ')).toHaveValue('12');

    await user.click(within(panel).getByRole('button', { name: 'Save against version 4' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/parts/${original.id}`));

    const [first, second] = patchBodies(fetchMock);
    expect(first).toMatchObject({ version: 3, description: 'My wording.' });
    expect(second).toMatchObject({ version: 4, description: 'My wording.' });
    // Their slew rate was taken; my gain-bandwidth went through on top of it.
    const params = second!.parameters as Record<string, { typ?: number }>;
    expect(params.slewRate?.typ).toBe(15e6);
    expect(params.gainBandwidth?.typ).toBe(12e6);
    expect(await screen.findByText('Saved. The change is listed in the history below.')).toBeInTheDocument();
  });

  it('can keep my value for a field I did not touch, or take theirs for one I did', async () => {
    let patches = 0;
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      [`GET /api/parts/${original.id}`]: () => json(200, original),
      [`GET /api/parts/${original.id}/revisions`]: () => json(200, { items: [] }),
      [`PATCH /api/parts/${original.id}`]: () => {
        patches += 1;
        return patches === 1
          ? json(409, { error: { code: 'version_conflict', message: 'Stale' }, current: theirs })
          : json(200, { ...theirs, version: 5 });
      },
    });
    renderApp(`/parts/${original.id}/edit`);
    const user = userEvent.setup();
    const description = await screen.findByLabelText('Description');
    await user.clear(description);
    await user.type(description, 'My wording.');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    const panel = await screen.findByTestId('conflict-panel');
    const [descRow, slewRow] = within(panel).getAllByRole('row').slice(1);
    await user.click(within(descRow!).getByRole('radio', { name: 'Take current' }));
    await user.click(within(slewRow!).getByRole('radio', { name: 'Keep mine' }));
    await user.click(within(panel).getByRole('button', { name: 'Save against version 4' }));
    await waitFor(() => expect(patchBodies(fetchMock)).toHaveLength(2));
    const second = patchBodies(fetchMock)[1]!;
    expect(second.version).toBe(4);
    expect(second).not.toHaveProperty('description');
    expect((second.parameters as Record<string, { typ?: number }>).slewRate?.typ).toBe(13e6);
  });

  it('refuses a number it cannot read, beside the box, without calling the server', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      [`GET /api/parts/${original.id}`]: () => json(200, original),
    });
    renderApp(`/parts/${original.id}/edit`);
    const user = userEvent.setup();
    const slew = await screen.findByLabelText('Slew rate typ');
    expect(slew).toHaveValue('13 V/µs');
    await user.clear(slew);
    await user.type(slew, 'fast');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText('One field needs another look')).toBeInTheDocument();
    expect(screen.getByLabelText('Slew rate typ')).toHaveAccessibleDescription(/"fast" is not a number engineers write/);
    expect(callsTo(fetchMock, 'PATCH', `/api/parts/${original.id}`)).toHaveLength(0);
  });

  it('puts the server’s field complaints beside the boxes they are about', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      [`GET /api/parts/${original.id}`]: () => json(200, original),
      [`PATCH /api/parts/${original.id}`]: () =>
        json(400, {
          error: {
            code: 'validation_failed',
            message: 'Check the fields',
            issues: [{ path: 'body.partNumber', message: 'Another part already has this number' }],
          },
        }),
    });
    renderApp(`/parts/${original.id}/edit`);
    const user = userEvent.setup();
    const number = await screen.findByLabelText('Part number');
    await user.clear(number);
    await user.type(number, 'NW4560');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(screen.getByLabelText('Part number')).toHaveAccessibleDescription('Another part already has this number'));
  });

  it('adds a part from the family’s definitions, checked with the shared schema', async () => {
    const created = makePart({ id: partId(202), partNumber: 'NW5532', version: 1 });
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      'POST /api/parts': () => json(201, created),
      [`GET /api/parts/${created.id}`]: () => json(200, created),
      [`GET /api/parts/${created.id}/revisions`]: () => json(200, { items: [] }),
    });
    const { router } = renderApp('/parts/new?family=op-amp');
    const user = userEvent.setup();
    expect(await screen.findByRole('heading', { level: 1, name: 'Add an op amp' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Add part' }));
    expect(await screen.findByText('2 fields need another look')).toBeInTheDocument();
    expect(screen.getByLabelText('Part number')).toHaveAccessibleDescription('Enter the part number');

    await user.type(screen.getByLabelText('Part number'), 'NW5532');
    await user.type(screen.getByLabelText('Manufacturer'), 'Northwind Analog');
    await user.type(screen.getByLabelText('Supply range min'), '2.5');
    await user.type(screen.getByLabelText('Supply range max'), '36');
    await user.type(screen.getByLabelText('Slew rate typ'), '9');
    await user.type(screen.getByLabelText('Slew rate, supply condition'), '30');
    await user.selectOptions(screen.getByLabelText('Pin layout'), 'dip8-dual-opamp');
    expect(screen.getByRole('img', { name: /Pinout preview: Dual op amp, 8 pins/ })).toBeInTheDocument();
    await user.type(screen.getByLabelText('Tags'), 'low noise, hi-fi, low noise');
    await user.click(screen.getByRole('button', { name: 'Add part' }));

    await waitFor(() => expect(router.state.location.pathname).toBe(`/parts/${created.id}`));
    const [, init] = callsTo(fetchMock, 'POST', '/api/parts')[0]!;
    expect(JSON.parse(String(init?.body))).toMatchObject({
      family: 'op-amp',
      partNumber: 'NW5532',
      manufacturer: 'Northwind Analog',
      pinLayout: 'dip8-dual-opamp',
      pinMap: {},
      tags: ['low noise', 'hi-fi'],
      parameters: { supplyVoltage: { min: 2.5, max: 36 }, slewRate: { typ: 9e6, conditions: { supply: 30 } } },
    });
  });
});
