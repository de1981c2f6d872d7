# Draws the Zeitlight app icon (build/icon.png, 512 x 512 RGBA) without image libraries:
# a dark rounded square with a low sun over a horizon and a thin day-arc. Run: python3 scripts/make-icon.py
import struct, zlib, math

SIZE, SS = 512, 3  # output size, supersampling factor per axis
BG = (29, 43, 58)          # deep blue-grey
SUN = (230, 159, 0)        # Okabe-Ito orange
HORIZON = (86, 180, 233)   # Okabe-Ito sky blue
ARC = (240, 228, 66)       # Okabe-Ito yellow

def inside_rounded_square(x, y, r=96):
    cx = min(max(x, r), SIZE - r); cy = min(max(y, r), SIZE - r)
    return (x - cx) ** 2 + (y - cy) ** 2 <= r * r

def colour_at(x, y):
    if not inside_rounded_square(x, y):
        return None
    sun_c, sun_r = (256, 318), 92
    if 326 <= y <= 346 and 86 <= x <= 426:
        return HORIZON
    d_arc = math.hypot(x - 256, y - 318)
    if y < 318 and abs(d_arc - 170) <= 7:
        return ARC
    if y < 326 and math.hypot(x - sun_c[0], y - sun_c[1]) <= sun_r:
        return SUN
    if y > 346 and 150 <= x <= 362 and (y - 346) % 34 < 12 and abs(x - 256) <= 106 - (y - 346) * 0.9:
        return (HORIZON[0] // 2 + BG[0] // 2, HORIZON[1] // 2 + BG[1] // 2, HORIZON[2] // 2 + BG[2] // 2)
    return BG

rows = []
for py in range(SIZE):
    row = bytearray([0])
    for px in range(SIZE):
        acc = [0, 0, 0, 0]
        for sy in range(SS):
            for sx in range(SS):
                c = colour_at(px + (sx + 0.5) / SS, py + (sy + 0.5) / SS)
                if c is not None:
                    acc[0] += c[0]; acc[1] += c[1]; acc[2] += c[2]; acc[3] += 255
        n = SS * SS
        a = acc[3] // n
        if a == 0:
            row += bytes([0, 0, 0, 0])
        else:
            cov = acc[3] / 255
            row += bytes([int(acc[0] / cov), int(acc[1] / cov), int(acc[2] / cov), a])
    rows.append(bytes(row))

def chunk(tag, data):
    return struct.pack('>I', len(data)) + tag + data + struct.pack('>I', zlib.crc32(tag + data) & 0xffffffff)

png = b'\x89PNG\r\n\x1a\n' + chunk(b'IHDR', struct.pack('>IIBBBBB', SIZE, SIZE, 8, 6, 0, 0, 0))
png += chunk(b'IDAT', zlib.compress(b''.join(rows), 9)) + chunk(b'IEND', b'')
open('build/icon.png', 'wb').write(png)
print('wrote build/icon.png')
