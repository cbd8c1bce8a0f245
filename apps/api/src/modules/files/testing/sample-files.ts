const base64 = (value: string) => Buffer.from(value, 'base64');

/** Small real files of each kind, and a few impostors, for upload tests. */
export const samples = {
  png: base64('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg=='),
  jpeg: Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00, 0xff, 0xd9]),
  gif: base64('R0lGODlhAQABAIAAAAAAAP///yH5BAEAAAAALAAAAAABAAEAAAIBRAA7'),
  webp: base64('UklGRiQAAABXRUJQVlA4IBgAAAAwAQCdASoBAAEAAwA0JaQAA3AA/vuUAAA='),
  pdf: Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n'),
  csv: Buffer.from('contributor,nominal,tolerance\nHousing bore depth,42.00,0.05\nBearing width,-20.00,0.02\n'),
  html: Buffer.from('<!DOCTYPE html><html><body><img src=x onerror="alert(1)"><script>alert(2)</script></body></html>'),
  svg: Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"><script>alert(2)</script></svg>'),
  exe: Buffer.concat([Buffer.from('MZ'), Buffer.alloc(62), Buffer.from('This program cannot be run in DOS mode.')]),
  zip: base64('UEsDBBQAAAAAAJMOgl2GphA2BQAAAAUAAAAFAAAAYS50eHRoZWxsb1BLAQIUAxQAAAAAAJMOgl2GphA2BQAAAAUAAAAFAAAAAAAAAAAAAACAAQAAAABhLnR4dFBLBQYAAAAAAQABADMAAAAoAAAAAAA='),
};
