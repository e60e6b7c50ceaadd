import type { PageBox } from '@understudy/shared-types';
import { Suspense, lazy, useEffect, useLayoutEffect, useRef, useState, type KeyboardEvent } from 'react';
import { Button, Spinner, cx } from '../../../components/ui';

function ViewerUnavailable() {
  return <p className="p-6 text-sm text-danger">The PDF viewer could not be loaded. Download the file to read it.</p>;
}

// pdf.js is large; it comes with this chunk only when a datasheet is opened.
const PdfPageCanvas = lazy(() =>
  import('./pdf-page-canvas')
    .then((m) => ({ default: m.PdfPageCanvas }))
    .catch(() => ({ default: ViewerUnavailable })),
);

/** CSS pixels are 1/96 in and PDF points 1/72 in: at 100 % a page shows at its printed size. */
const PX_PER_POINT = 96 / 72;
const ZOOM_STEPS = [0.5, 0.75, 1, 1.25, 1.5, 2, 3];
const LETTER = { width: 612, height: 792 };

type Zoom = { mode: 'fit-width' } | { mode: 'fit-page' } | { mode: 'fixed'; zoom: number };

export interface PdfViewerProps {
  url: string;
  fileName: string;
  page: number;
  onPageChange: (page: number) => void;
  /** Pages and their sizes in points, when the parser has measured them. */
  pageCount?: number;
  pageSizes?: ReadonlyArray<{ width: number; height: number }>;
  /** Boxes on the current page to draw attention to, in PDF points from the top-left corner. */
  highlights?: readonly PageBox[];
}

function useElementWidth<T extends HTMLElement>() {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(0);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el) return;
    setWidth(el.clientWidth);
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => setWidth(entry?.contentRect.width ?? el.clientWidth));
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return [ref, width] as const;
}

/** One page at a time with page buttons and keys, zoom to fit, and the selected finding's source boxes on top. */
export function PdfViewer({ url, fileName, page, onPageChange, pageCount, pageSizes, highlights = [] }: PdfViewerProps) {
  const [zoom, setZoom] = useState<Zoom>({ mode: 'fit-width' });
  const [numPages, setNumPages] = useState<number | undefined>(undefined);
  const [measured, setMeasured] = useState<{ width: number; height: number } | undefined>(undefined);
  const [error, setError] = useState<string | null>(null);
  const [scrollRef, containerWidth] = useElementWidth<HTMLDivElement>();
  const overlayRef = useRef<HTMLDivElement>(null);

  const total = numPages ?? pageCount ?? 1;
  const size = pageSizes?.[page - 1] ?? measured ?? LETTER;
  // 24 px of breathing room around the page.
  const available = Math.max(200, (containerWidth || 640) - 24);
  const fitWidth = available / (size.width * PX_PER_POINT);
  const fitPage = Math.min(fitWidth, (typeof window === 'undefined' ? 800 : window.innerHeight * 0.7) / (size.height * PX_PER_POINT));
  const effective = zoom.mode === 'fit-width' ? fitWidth : zoom.mode === 'fit-page' ? fitPage : zoom.zoom;
  const scale = effective * PX_PER_POINT;
  const cssWidth = size.width * scale;
  const cssHeight = size.height * scale;

  const go = (next: number) => onPageChange(Math.min(total, Math.max(1, next)));
  const zoomIn = () => setZoom({ mode: 'fixed', zoom: ZOOM_STEPS.find((s) => s > effective + 0.01) ?? ZOOM_STEPS[ZOOM_STEPS.length - 1]! });
  const zoomOut = () => setZoom({ mode: 'fixed', zoom: [...ZOOM_STEPS].reverse().find((s) => s < effective - 0.01) ?? ZOOM_STEPS[0]! });

  const highlightKey = JSON.stringify([page, highlights]);
  useEffect(() => {
    overlayRef.current?.querySelector('[data-source-box]')?.scrollIntoView?.({ block: 'nearest', inline: 'nearest', behavior: 'smooth' });
  }, [highlightKey]);

  function onKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    if (event.altKey || event.ctrlKey || event.metaKey) return;
    const actions: Record<string, () => void> = {
      ArrowLeft: () => go(page - 1),
      PageUp: () => go(page - 1),
      ArrowRight: () => go(page + 1),
      PageDown: () => go(page + 1),
      Home: () => go(1),
      End: () => go(total),
      '+': zoomIn,
      '=': zoomIn,
      '-': zoomOut,
      '0': () => setZoom({ mode: 'fit-width' }),
    };
    const action = actions[event.key];
    if (!action) return;
    event.preventDefault();
    event.stopPropagation();
    action();
  }

  return (
    <div className="flex min-w-0 flex-col">
      <div className="flex flex-wrap items-center justify-between gap-2 border-b border-rule px-3 py-2">
        <div className="flex items-center gap-1.5">
          <Button variant="secondary" size="sm" onClick={() => go(page - 1)} disabled={page <= 1} aria-label="Previous page">
            ‹
          </Button>
          <span className="min-w-24 text-center text-sm text-ink tabular-nums" aria-live="polite">
            Page {page} of {total}
          </span>
          <Button variant="secondary" size="sm" onClick={() => go(page + 1)} disabled={page >= total} aria-label="Next page">
            ›
          </Button>
        </div>
        <div className="flex items-center gap-1.5">
          <Button variant="ghost" size="sm" onClick={zoomOut} aria-label="Zoom out">
            −
          </Button>
          <span className="w-12 text-center text-xs text-ink-soft tabular-nums">{Math.round(effective * 100)} %</span>
          <Button variant="ghost" size="sm" onClick={zoomIn} aria-label="Zoom in">
            +
          </Button>
          <Button
            variant={zoom.mode === 'fit-width' ? 'secondary' : 'ghost'}
            size="sm"
            aria-pressed={zoom.mode === 'fit-width'}
            onClick={() => setZoom({ mode: 'fit-width' })}
          >
            Fit width
          </Button>
          <Button
            variant={zoom.mode === 'fit-page' ? 'secondary' : 'ghost'}
            size="sm"
            aria-pressed={zoom.mode === 'fit-page'}
            onClick={() => setZoom({ mode: 'fit-page' })}
          >
            Fit page
          </Button>
        </div>
      </div>
      <div
        ref={scrollRef}
        role="region"
        aria-label={`${fileName}, page ${page} of ${total}`}
        aria-keyshortcuts="ArrowLeft ArrowRight PageUp PageDown Home End + - 0"
        tabIndex={0}
        onKeyDown={onKeyDown}
        className="max-h-[75vh] min-h-64 overflow-auto bg-paper-deep p-3 outline-none focus-visible:outline-2 focus-visible:-outline-offset-2"
      >
        {error ? (
          <p role="alert" className="p-6 text-sm text-danger">
            The PDF could not be shown: {error}
          </p>
        ) : (
          <div className="relative mx-auto bg-card shadow-md" style={{ width: cssWidth, height: cssHeight }}>
            <Suspense
              fallback={
                <span className="flex h-full items-center justify-center gap-2 text-sm text-ink-soft">
                  <Spinner className="size-5 text-copper" /> Opening the PDF…
                </span>
              }
            >
              <PdfPageCanvas
                url={url}
                pageNumber={page}
                scale={scale}
                label={`Page ${page} of ${fileName}`}
                onDocument={({ numPages: n }) => setNumPages(n)}
                onPageSize={(s) => setMeasured((m) => (m && m.width === s.width && m.height === s.height ? m : s))}
                onError={setError}
              />
            </Suspense>
            <div ref={overlayRef} aria-hidden="true" className="pointer-events-none absolute inset-0">
              {highlights.map((box, i) => (
                <div
                  key={i}
                  data-source-box=""
                  className={cx('absolute rounded-sm bg-copper-bright/20 ring-2 ring-copper', 'motion-safe:animate-[pulse_1.2s_ease-in-out_2]')}
                  style={{
                    left: `${(box.x / size.width) * 100}%`,
                    top: `${(box.y / size.height) * 100}%`,
                    width: `${(box.width / size.width) * 100}%`,
                    height: `${(box.height / size.height) * 100}%`,
                  }}
                />
              ))}
            </div>
          </div>
        )}
      </div>
      <p className="border-t border-rule px-3 py-1.5 text-xs text-ink-faint">
        With the page focused: ← → or Page Up/Down to turn pages, + and − to zoom, 0 to fit the width.
      </p>
    </div>
  );
}
