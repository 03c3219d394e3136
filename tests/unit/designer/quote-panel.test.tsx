// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen, waitFor, within } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import type { QuotePreviewRequest, QuotePreviewResponse } from '../../../server/src/contracts/quotes.ts';
import { DesignQuote } from '../../../storefront/src/features/quote/components/design-quote.tsx';

/** A request for the bishop dress; only its identity matters here, since the server's answers are stubbed. */
const requestFor = (widthMm: number): QuotePreviewRequest => ({
  garmentId: 3,
  sizeId: 301,
  quantity: 1,
  isRush: false,
  document: {
    version: 1,
    placements: [
      {
        id: 'drawing',
        kind: 'artwork',
        zone: 'chest',
        centerXMm: 209,
        centerYMm: 105,
        rotationDeg: 0,
        artworkUploadId: 41,
        widthMm,
      },
    ],
  },
});

function answer(totalCents: number, overrides: Partial<QuotePreviewResponse> = {}): QuotePreviewResponse {
  return {
    quote: {
      lines: [
        { code: 'garment', label: 'Bishop dress, size 6 months × 1 garment', amountCents: 3400 },
        {
          code: 'stitching',
          label: 'Your artwork: 4,210 stitches × 1 garment',
          amountCents: totalCents - 3400 - 2500,
          placementId: 'drawing',
        },
        { code: 'artwork-setup', label: 'Artwork setup: 1 design, once per order', amountCents: 2500 },
      ],
      subtotalCents: totalCents,
      shippingCents: 0,
      taxCents: 0,
      totalCents,
      currency: 'USD',
      ruleSetVersion: 1,
    },
    placements: [
      {
        id: 'drawing',
        label: 'Your artwork',
        kind: 'artwork',
        stitches: 4210,
        colourChanges: 2,
        hoopings: 1,
        widthMm: 60,
        heightMm: 30,
      },
    ],
    runMinutes: { totalMinutes: 20, items: [] },
    stabilizer: { backing: 'cutaway', topping: null, density: 'medium', messages: [] },
    cautions: [
      {
        code: 'caution.small-parts',
        severity: 'warning',
        title: 'Nothing that can come off',
        text: 'For a child under 3, add nothing that can detach.',
        appliesWhen: 'under 3',
      },
    ],
    ...overrides,
  };
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

let fetchMock: ReturnType<typeof vi.fn>;
beforeEach(() => {
  fetchMock = vi.fn();
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

function renderPanel(request: QuotePreviewRequest) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const wrap = (node: ReactNode) => <QueryClientProvider client={client}>{node}</QueryClientProvider>;
  const view = render(wrap(<DesignQuote request={request} />));
  return { ...view, show: (next: QuotePreviewRequest) => view.rerender(wrap(<DesignQuote request={next} />)) };
}

const panel = () => screen.getByRole('region', { name: 'Your price' });

describe('the quote panel', () => {
  it('when the server prices the design, then every line and the total show as the server sent them, with its safety notes', async () => {
    fetchMock.mockResolvedValueOnce(json(200, answer(7400)));
    renderPanel(requestFor(60));
    const table = await within(panel()).findByRole('table', { name: 'How the price is made up' });
    expect(
      within(table)
        .getAllByRole('row')
        .map((row) => row.textContent),
    ).toEqual([
      'Bishop dress, size 6 months × 1 garment$34.00',
      'Your artwork: 4,210 stitches × 1 garment$15.00',
      'Artwork setup: 1 design, once per order$25.00',
      'Total$74.00',
    ]);
    const notes = within(panel()).getByRole('region', { name: 'Safety notes for this size' });
    expect(notes.textContent).toContain('Important: Nothing that can come off');
    expect(notes.textContent).toContain('follow the children’s product rules where you live');
    expect(fetchMock).toHaveBeenCalledTimes(1);
    expect(JSON.parse(fetchMock.mock.calls[0]![1].body)).toEqual(requestFor(60));
  });

  it('when the design changes, then the last price stays on show, marked as updating, until the next arrives', async () => {
    fetchMock.mockResolvedValueOnce(json(200, answer(7400)));
    const { show } = renderPanel(requestFor(60));
    await within(panel()).findByText('$74.00');

    let release!: (response: Response) => void;
    fetchMock.mockReturnValueOnce(new Promise<Response>((resolve) => (release = resolve)));
    show(requestFor(80));
    expect(within(panel()).getByRole('status').textContent).toBe('Pricing…');
    expect(within(panel()).getByText('$74.00')).toBeTruthy();
    await waitFor(() => expect(fetchMock).toHaveBeenCalledTimes(2));
    expect(within(panel()).getByText('$74.00')).toBeTruthy();

    release(json(200, answer(8200)));
    await within(panel()).findByText('$82.00');
    expect(within(panel()).queryByText('$74.00')).toBeNull();
    expect(within(panel()).getByRole('status').textContent).toBe('');
  });

  it('when the server refuses the design, then its reason shows in place of the price', async () => {
    fetchMock.mockResolvedValueOnce(
      json(400, {
        error: {
          kind: 'invalid',
          message:
            'Your artwork at 250 mm wide comes to 250 × 250 mm, bigger than the 200 × 300 mm sewing field of our largest hoop; make it smaller.',
        },
      }),
    );
    renderPanel(requestFor(250));
    expect((await within(panel()).findByRole('alert')).textContent).toContain(
      'bigger than the 200 × 300 mm sewing field of our largest hoop',
    );
    expect(within(panel()).queryByRole('table')).toBeNull();
  });

  it('when a picture still has to be digitized, then the panel says the studio will confirm the price', async () => {
    const provisional = answer(5700, {
      placements: [
        {
          id: 'drawing',
          label: 'Your artwork',
          kind: 'artwork',
          stitches: 0,
          colourChanges: 0,
          hoopings: 1,
          widthMm: 60,
          heightMm: 60,
          isPriceProvisional: true,
        },
      ],
    });
    fetchMock.mockResolvedValueOnce(json(200, provisional));
    renderPanel(requestFor(60));
    expect(
      await within(panel()).findByText(/The studio will confirm the price after digitizing your picture/),
    ).toBeTruthy();
    expect(panel().textContent).toContain('Your artwork: stitches counted once the studio has digitized it, 1 hooping');
  });

  it('when there is nothing on the garment, then nothing is asked of the server', () => {
    renderPanel({ ...requestFor(60), document: { version: 1, placements: [] } });
    expect(panel().textContent).toContain('Add a border, a name or a motif and the price appears here');
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
