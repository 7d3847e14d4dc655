import { act } from '@testing-library/react';
import { vi } from 'vitest';

/**
 * A stand-in for XMLHttpRequest, which the photo uploads (office and daily log) use for their
 * progress events: each request is kept so a test can read what was sent, report progress and
 * answer it.
 */
export class FakeXhr {
  static sent: FakeXhr[] = [];
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: unknown = null;
  status = 0;
  statusText = '';
  responseText = '';
  upload: { onprogress: ((event: ProgressEvent) => void) | null } = { onprogress: null };
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
  send(body: unknown) {
    this.body = body;
    FakeXhr.sent.push(this);
  }
  abort() {
    this.onabort?.();
  }

  /** Reports `loaded` of `total` bytes sent. */
  progress(loaded: number, total: number) {
    act(() => this.upload.onprogress?.({ lengthComputable: true, loaded, total } as ProgressEvent));
  }
  async respond(status: number, body: unknown) {
    this.status = status;
    this.statusText = status === 201 ? 'Created' : status === 200 ? 'OK' : 'Error';
    this.responseText = JSON.stringify(body);
    await act(async () => this.onload?.());
  }
}

export function stubXhr() {
  FakeXhr.sent = [];
  vi.stubGlobal('XMLHttpRequest', FakeXhr);
}

/** The file field and the form fields of a multipart body. */
export function formFields(body: unknown): Record<string, unknown> {
  if (!(body instanceof FormData)) throw new Error('The body is not a FormData');
  return Object.fromEntries(body.entries());
}
