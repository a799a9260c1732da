import { PNG } from 'pngjs';

// Tiny media files made in the test, so no binary fixture is kept or downloaded.

// A mono 16-bit PCM WAV of a sine tone (RIFF/WAVE, as the Microsoft multimedia format defines it).
export function makeWav(durationMs: number, sampleRate = 8000, frequencyHz = 440): Buffer {
  const samples = Math.round((sampleRate * durationMs) / 1000);
  const data = Buffer.alloc(samples * 2);
  for (let i = 0; i < samples; i += 1) {
    data.writeInt16LE(Math.round(Math.sin((2 * Math.PI * frequencyHz * i) / sampleRate) * 12000), i * 2);
  }
  const header = Buffer.alloc(44);
  header.write('RIFF', 0, 'ascii');
  header.writeUInt32LE(36 + data.length, 4);
  header.write('WAVE', 8, 'ascii');
  header.write('fmt ', 12, 'ascii');
  header.writeUInt32LE(16, 16);
  header.writeUInt16LE(1, 20); // PCM
  header.writeUInt16LE(1, 22); // mono
  header.writeUInt32LE(sampleRate, 24);
  header.writeUInt32LE(sampleRate * 2, 28);
  header.writeUInt16LE(2, 32);
  header.writeUInt16LE(16, 34);
  header.write('data', 36, 'ascii');
  header.writeUInt32LE(data.length, 40);
  return Buffer.concat([header, data]);
}

// The first page of an Ogg Opus stream: page header, one segment, the OpusHead packet (RFC 7845 5.1).
export function makeOggOpusHead(): Buffer {
  const head = Buffer.alloc(19);
  head.write('OpusHead', 0, 'ascii');
  head.writeUInt8(1, 8); // version
  head.writeUInt8(1, 9); // channels
  head.writeUInt16LE(312, 10); // pre-skip
  head.writeUInt32LE(48000, 12); // input sample rate
  const page = Buffer.alloc(27);
  page.write('OggS', 0, 'ascii');
  page.writeUInt8(0x02, 5); // beginning of stream
  page.writeUInt32LE(1, 14); // serial number
  page.writeUInt8(1, 26); // one segment
  return Buffer.concat([page, Buffer.from([head.length]), head]);
}

// A 2×2 grey PNG.
export function makePng(): Buffer {
  const image = new PNG({ width: 2, height: 2 });
  for (let pixel = 0; pixel < 4; pixel += 1) image.data.set([128, 128, 128, 255], pixel * 4);
  return PNG.sync.write(image, { colorType: 0 });
}
