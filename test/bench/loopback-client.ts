/**
 * A lean HTTP client for timing one request after another: node:http over one kept-alive socket,
 * as a browser keeps its connection to the shop's server. fetch (undici) adds about 0.6 ms and
 * twice the jitter per request on this machine, which the figures would charge to the server.
 */
import http from 'node:http';

export interface LoopbackClient {
  /** Sends one request and reads the whole answer; anything but a 200 throws with the start of the body. */
  ok: (method: 'GET' | 'POST', url: string, token?: string, body?: unknown) => Promise<string>;
  close: () => void;
}

export function loopbackClient(): LoopbackClient {
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  const ok: LoopbackClient['ok'] = (method, url, token, body) =>
    new Promise((resolve, reject) => {
      const payload = body === undefined ? undefined : JSON.stringify(body);
      const headers: http.OutgoingHttpHeaders = {};
      if (token) headers.authorization = `Bearer ${token}`;
      if (payload !== undefined) {
        headers['content-type'] = 'application/json';
        headers['content-length'] = Buffer.byteLength(payload);
      }
      const request = http.request(url, { method, agent, headers }, (response) => {
        let text = '';
        response.setEncoding('utf8');
        response.on('data', (chunk: string) => (text += chunk));
        response.on('end', () => {
          if (response.statusCode === 200) resolve(text);
          else reject(new Error(`${method} ${url} answered ${response.statusCode}: ${text.slice(0, 500)}`));
        });
        response.on('error', reject);
      });
      request.on('error', reject);
      request.end(payload);
    });
  return { ok, close: () => agent.destroy() };
}
