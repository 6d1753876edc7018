import request from 'supertest';
import type { Express } from 'express';

/**
 * A browser-like API client for tests: keeps cookies and sends the CSRF token on state changes,
 * as the real client does.
 */
export class TestClient {
  agent: ReturnType<typeof request.agent>;
  csrf: string | null = null;
  constructor(public app: Express) {
    this.agent = request.agent(app);
  }
  async token(): Promise<string> {
    if (!this.csrf) this.csrf = (await this.agent.get('/api/auth/csrf').expect(200)).body.token as string;
    return this.csrf;
  }
  get(url: string) {
    return this.agent.get(url);
  }
  async post(url: string, body?: object) {
    // The token first: superagent attaches cookies when the request is created.
    const token = await this.token();
    return this.agent
      .post(url)
      .set('X-CSRF-Token', token)
      .send(body ?? {});
  }
  async patch(url: string, body?: object) {
    // The token first: superagent attaches cookies when the request is created.
    const token = await this.token();
    return this.agent
      .patch(url)
      .set('X-CSRF-Token', token)
      .send(body ?? {});
  }
  async put(url: string, body?: object) {
    // The token first: superagent attaches cookies when the request is created.
    const token = await this.token();
    return this.agent
      .put(url)
      .set('X-CSRF-Token', token)
      .send(body ?? {});
  }
  async delete(url: string) {
    const token = await this.token();
    return this.agent.delete(url).set('X-CSRF-Token', token);
  }
  /** A multipart upload with the token, as the client's XHR upload does. */
  async upload(url: string, field: string, file: Buffer | string, filename: string) {
    const token = await this.token();
    const req = this.agent.post(url).set('X-CSRF-Token', token);
    return typeof file === 'string' ? req.attach(field, file, filename) : req.attach(field, file, filename);
  }
  async signIn(email: string, password: string) {
    const res = await this.post('/api/auth/sign-in', { email, password });
    this.csrf = res.body.csrfToken ?? null;
    return res;
  }
}
