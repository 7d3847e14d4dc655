/** The part of autocannon 8's programmatic API the bench uses (the package ships no types). */
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  export type AutocannonRequest = {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string;
    setupRequest?: (request: AutocannonRequest, context: object) => AutocannonRequest;
    onResponse?: (status: number, body: string, context: object) => void;
  };

  export type AutocannonClient = EventEmitter & {
    setRequests(requests: AutocannonRequest[]): void;
  };

  export type AutocannonOptions = {
    url: string;
    connections: number;
    pipelining?: number;
    duration?: number;
    timeout?: number;
    requests?: AutocannonRequest[];
    setupClient?: (client: AutocannonClient) => void;
  };

  export type AutocannonResult = {
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    statusCodeStats: Record<string, { count: number }>;
  };

  /** An event emitter that is also a thenable: awaiting it gives the results. */
  export type AutocannonInstance = EventEmitter &
    PromiseLike<AutocannonResult> & {
      stop(): void;
    };

  function autocannon(options: AutocannonOptions): AutocannonInstance;
  export default autocannon;
}
