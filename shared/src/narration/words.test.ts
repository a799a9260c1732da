import { describe, expect, it } from 'vitest';
import { narrationWords } from './words.js';

function surfaces(text: string, locale: 'en' | 'es'): string[] {
  return narrationWords(text, locale).map((word) => word.surface);
}

describe('narrationWords', () => {
  it('stems English and Spanish plurals to one form', () => {
    const stems = (text: string, locale: 'en' | 'es') => narrationWords(text, locale).map((word) => word.stem);
    expect(stems('tires chambers', 'en')).toEqual(stems('tire chamber', 'en'));
    expect(stems('llantas mangueras', 'es')).toEqual(stems('llanta manguera', 'es'));
  });

  it('reads a spoken tread depth as the fraction of an inch the checklist writes', () => {
    expect(surfaces('four thirty seconds', 'en')).toEqual(['1/8']);
    expect(surfaces('one eighth', 'en')).toEqual(['1/8']);
    expect(surfaces('four thirty two', 'en')).toEqual(['1/8']);
    expect(surfaces('four and a half thirty seconds', 'en')).toEqual(['9/64']);
    expect(surfaces('tread depth at least 4 thirty-seconds', 'en')).toEqual(
      surfaces('tread depth at least 4/32', 'en'),
    );
    expect(surfaces('cuatro treintaidosavos', 'es')).toEqual(['1/8']);
    expect(surfaces('dibujo de 4/32 de pulgada', 'es')).toEqual(['dibujo', 'de', '1/8', 'de', 'pulgada']);
  });

  it('writes each number as its value: a whole number, a common fraction, else a decimal', () => {
    expect(surfaces('axle two at one hundred ten psi', 'en')).toEqual(['axle', '2', 'at', '110', 'psi']);
    expect(surfaces('free play under 5.25 inches', 'en')).toEqual(['free', 'play', 'under', '5-1/4', 'inches']);
    expect(surfaces('five and a quarter', 'en')).toEqual(['5-1/4']);
    expect(surfaces('one and three quarters', 'en')).toEqual(['1-3/4']);
    expect(surfaces('point one', 'en')).toEqual(['0.1']);
  });

  it('keeps an article alone as a word', () => {
    expect(surfaces('a tire with an air leak', 'en')).toEqual(['a', 'tire', 'with', 'an', 'air', 'leak']);
    expect(surfaces('una llanta', 'es')).toEqual(['una', 'llanta']);
  });
});
