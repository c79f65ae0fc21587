import { describe, expect, it } from 'vitest';
import { QueueSettingError, queueUrlFrom } from '../../api/queue/queue-setting.ts';

describe('TREMORA_QUEUE', () => {
  it('is off when unset or empty', () => {
    expect(queueUrlFrom({})).toBeUndefined();
    expect(queueUrlFrom({ TREMORA_QUEUE: ' ' })).toBeUndefined();
  });

  it('takes a redis:// or rediss:// URL', () => {
    expect(queueUrlFrom({ TREMORA_QUEUE: 'redis://127.0.0.1:6379' })).toBe(
      'redis://127.0.0.1:6379',
    );
    expect(queueUrlFrom({ TREMORA_QUEUE: 'rediss://queue.example:6380/2' })).toBe(
      'rediss://queue.example:6380/2',
    );
  });

  it('names the setting and what was expected otherwise', () => {
    expect(() => queueUrlFrom({ TREMORA_QUEUE: 'http://127.0.0.1:6379' })).toThrow(
      QueueSettingError,
    );
    expect(() => queueUrlFrom({ TREMORA_QUEUE: '127.0.0.1:6379' })).toThrow(
      /^TREMORA_QUEUE: expected a Redis URL such as redis:\/\/127\.0\.0\.1:6379; got "127\.0\.0\.1:6379"$/,
    );
  });
});
