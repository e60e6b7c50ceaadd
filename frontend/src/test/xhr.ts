import { act } from '@testing-library/react';
import { vi } from 'vitest';

/**
 * Stands in for XMLHttpRequest, which the datasheet upload uses for its progress events. Each send is recorded;
 * the test then drives progress and the answer.
 */
export class FakeXhr {
  static sent: FakeXhr[] = [];

  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: FormData | null = null;
  status = 0;
  responseText = '';
  aborted = false;
  upload: { onprogress: ((event: { loaded: number; total: number; lengthComputable: boolean }) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;

  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }

  setRequestHeader(name: string, value: string) {
    this.headers[name.toLowerCase()] = value;
  }

  send(body: FormData) {
    this.body = body;
    FakeXhr.sent.push(this);
  }

  abort() {
    this.aborted = true;
    this.onabort?.();
  }

  /** The uploaded file's name, read from the multipart body. */
  get fileName(): string | undefined {
    const file = this.body?.get('files');
    return file instanceof File ? file.name : undefined;
  }

  progress(loaded: number, total: number) {
    act(() => this.upload.onprogress?.({ loaded, total, lengthComputable: true }));
  }

  /** Answers; awaited, so the promise chain behind the upload settles inside act. */
  async respond(status: number, body: unknown) {
    await act(async () => {
      this.status = status;
      this.responseText = body === undefined ? '' : JSON.stringify(body);
      this.onload?.();
    });
  }

  async fail() {
    await act(async () => this.onerror?.());
  }
}

export function stubXhr(): typeof FakeXhr.sent {
  FakeXhr.sent = [];
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
  return FakeXhr.sent;
}

export function pdfFile(name = 'nw4580.pdf', bytes = 1000): File {
  return new File([new Uint8Array(bytes)], name, { type: 'application/pdf' });
}
