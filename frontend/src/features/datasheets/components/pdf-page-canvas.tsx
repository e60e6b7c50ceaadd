import { GlobalWorkerOptions, RenderingCancelledException, getDocument, type PDFDocumentProxy, type RenderTask } from 'pdfjs-dist';
import workerUrl from 'pdfjs-dist/build/pdf.worker.min.mjs?url';
import { useEffect, useRef, useState } from 'react';

GlobalWorkerOptions.workerSrc = workerUrl;

export interface PdfPageCanvasProps {
  url: string;
  pageNumber: number;
  /** CSS pixels per PDF point. */
  scale: number;
  label: string;
  onDocument?: (info: { numPages: number }) => void;
  /** The page's size in PDF points, once known. */
  onPageSize?: (size: { width: number; height: number }) => void;
  onError?: (message: string) => void;
}

/**
 * The only piece that touches pdf.js: draws one page onto a canvas. Loaded lazily with pdf.js itself, so the
 * catalog never downloads it, and replaced by a stand-in in tests (jsdom has no canvas).
 */
export function PdfPageCanvas({ url, pageNumber, scale, label, onDocument, onPageSize, onError }: PdfPageCanvasProps) {
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const [doc, setDoc] = useState<PDFDocumentProxy | null>(null);
  const callbacks = useRef({ onDocument, onPageSize, onError });
  callbacks.current = { onDocument, onPageSize, onError };
  // A canvas takes one render at a time: the next waits until the cancelled one has let go.
  const previous = useRef<Promise<unknown>>(Promise.resolve());

  useEffect(() => {
    let alive = true;
    const task = getDocument({ url, isEvalSupported: false });
    task.promise.then(
      (loaded) => {
        if (!alive) return;
        setDoc(loaded);
        callbacks.current.onDocument?.({ numPages: loaded.numPages });
      },
      (error: unknown) => {
        if (alive) callbacks.current.onError?.(error instanceof Error ? error.message : 'The PDF could not be opened.');
      },
    );
    return () => {
      alive = false;
      setDoc(null);
      void task.destroy();
    };
  }, [url]);

  useEffect(() => {
    if (!doc) return;
    let cancelled = false;
    let task: RenderTask | undefined;
    const run = previous.current.then(async () => {
      if (cancelled) return;
      const page = await doc.getPage(pageNumber);
      if (cancelled) return;
      const base = page.getViewport({ scale: 1 });
      callbacks.current.onPageSize?.({ width: base.width, height: base.height });
      const viewport = page.getViewport({ scale });
      const ratio = window.devicePixelRatio || 1;
      const canvas = canvasRef.current;
      if (!canvas) return;
      canvas.width = Math.floor(viewport.width * ratio);
      canvas.height = Math.floor(viewport.height * ratio);
      canvas.style.width = `${viewport.width}px`;
      canvas.style.height = `${viewport.height}px`;
      task = page.render({ canvas, viewport, transform: ratio === 1 ? undefined : [ratio, 0, 0, ratio, 0, 0] });
      await task.promise;
    });
    previous.current = run.catch((error: unknown) => {
      if (!cancelled && !(error instanceof RenderingCancelledException)) {
        callbacks.current.onError?.(error instanceof Error ? error.message : 'The page could not be drawn.');
      }
    });
    return () => {
      cancelled = true;
      task?.cancel();
    };
  }, [doc, pageNumber, scale]);

  return <canvas ref={canvasRef} role="img" aria-label={label} className="block" />;
}
