// jsdom hides Node's fetch API; msw and the client fetch helper need the real ones.
const { TestEnvironment } = require('jest-environment-jsdom');

class ClientEnvironment extends TestEnvironment {
  constructor(config, context) {
    super(config, context);
    const names = ['fetch', 'Request', 'Response', 'Headers', 'FormData', 'Blob', 'ReadableStream', 'WritableStream',
      'TransformStream', 'TextEncoder', 'TextDecoder', 'BroadcastChannel', 'structuredClone', 'AbortController', 'AbortSignal',
      'URL', 'URLSearchParams', 'TextDecoderStream', 'TextEncoderStream'];
    // MessageChannel stays out: React's scheduler would keep a port open and jest would never exit.
    for (const name of names) {
      if (globalThis[name] !== undefined) this.global[name] = globalThis[name];
    }
  }
}

module.exports = ClientEnvironment;
