import { attachmentDisposition } from './content-disposition';

describe('attachmentDisposition', () => {
  it('passes a plain name through', () => {
    expect(attachmentDisposition('bay3.jpg')).toBe(`attachment; filename="bay3.jpg"; filename*=UTF-8''bay3.jpg`);
  });

  it('keeps non-ASCII names exact in filename* and safe in the fallback', () => {
    expect(attachmentDisposition('Probe ä "1".jdx')).toBe(`attachment; filename="Probe _ _1_.jdx"; filename*=UTF-8''Probe%20%C3%A4%20%221%22.jdx`);
    expect(attachmentDisposition("it's (1).csv")).toBe(`attachment; filename="it's (1).csv"; filename*=UTF-8''it%27s%20%281%29.csv`);
  });
});
