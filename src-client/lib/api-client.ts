import { clientConfig } from '../config/env';

/** The typed error every API call throws; UI code decides on toasts and redirects. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }

  /** Field problems of a VALIDATION_FAILED answer, keyed by field. */
  get fieldErrors(): Record<string, string> {
    const fields = (this.body.fields as { field: string; message: string }[] | undefined) ?? [];
    return Object.fromEntries(fields.map((f) => [f.field, f.message]));
  }
}

const TOKEN_KEY = 'bandwright.token';
export const SESSION_ENDED_EVENT = 'bandwright:session-ended';

export const tokenStore = {
  get: (): string | null => localStorage.getItem(TOKEN_KEY),
  set: (token: string) => localStorage.setItem(TOKEN_KEY, token),
  clear: () => localStorage.removeItem(TOKEN_KEY),
};

export type Query = Record<string, string | number | boolean | undefined | null | (string | number)[]>;

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  query?: Query;
  body?: unknown;
  form?: FormData;
  signal?: AbortSignal;
  /** Upload progress 0..1 (uses XMLHttpRequest, since fetch has no upload progress). */
  onUploadProgress?: (fraction: number) => void;
  raw?: boolean;
}

export function buildUrl(path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, Array.isArray(value) ? value.join(',') : String(value));
  }
  const qs = params.toString();
  return `${clientConfig.apiBase}${path}${qs ? `?${qs}` : ''}`;
}

async function toApiError(status: number, text: string): Promise<ApiError> {
  let body: Record<string, unknown>;
  try {
    body = JSON.parse(text);
  } catch {
    body = { message: text.slice(0, 200) };
  }
  const error = new ApiError(status, String(body.code ?? 'HTTP_ERROR'), String(body.message ?? `Request failed (${status})`), body);
  if (status === 401 && tokenStore.get()) {
    tokenStore.clear();
    window.dispatchEvent(new CustomEvent(SESSION_ENDED_EVENT, { detail: { code: error.code, message: error.message } }));
  }
  return error;
}

function xhrUpload(url: string, options: RequestOptions, token: string | null): Promise<{ status: number; text: string }> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(options.method ?? 'POST', url);
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    xhr.upload.onprogress = (e) => e.lengthComputable && options.onUploadProgress?.(e.loaded / e.total);
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () => reject(new ApiError(0, 'NETWORK_ERROR', 'The server could not be reached'));
    options.signal?.addEventListener('abort', () => xhr.abort());
    xhr.send(options.form!);
  });
}

/** fetch with the session's token; a network failure becomes ApiError NETWORK_ERROR. */
async function send(url: string, options: RequestOptions, token: string | null): Promise<Response> {
  const headers: Record<string, string> = {};
  if (token) headers.Authorization = `Bearer ${token}`;
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  try {
    return await fetch(url, {
      method: options.method ?? 'GET',
      headers,
      body: options.form ?? (options.body !== undefined ? JSON.stringify(options.body) : undefined),
      signal: options.signal,
    });
  } catch (error) {
    if ((error as Error).name === 'AbortError') throw error;
    throw new ApiError(0, 'NETWORK_ERROR', 'The server could not be reached');
  }
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const token = tokenStore.get();
  const url = buildUrl(path, options.query);
  let status: number;
  let text: string;
  if (options.form && options.onUploadProgress) {
    ({ status, text } = await xhrUpload(url, options, token));
  } else {
    const response = await send(url, options, token);
    status = response.status;
    text = await response.text();
  }
  if (status >= 400) throw await toApiError(status, text);
  if (options.raw) return text as T;
  return (text ? JSON.parse(text) : undefined) as T;
}

/** A file route's body as bytes (a stored PDF must not pass through text), with apiRequest's token and errors. */
export async function apiBlob(path: string, query?: Query): Promise<Blob> {
  const response = await send(buildUrl(path, query), {}, tokenStore.get());
  if (response.status >= 400) throw await toApiError(response.status, await response.text());
  return response.blob();
}
