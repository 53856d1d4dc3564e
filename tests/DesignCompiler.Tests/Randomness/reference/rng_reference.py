#!/usr/bin/env python3
"""Independent reference implementation of the generators in DesignCompiler.Randomness.

Written from the published algorithm descriptions only, with Python integers masked
to 64 bits, so that the C# tests can pin exact outputs:

* SplitMix64: G. L. Steele, D. Lea, C. H. Flood (2014), "Fast splittable
  pseudorandom number generators", OOPSLA 2014. Golden-gamma increment
  0x9E3779B97F4A7C15 and the "mix64" finaliser (variant 13).
* xoshiro256**: D. Blackman, S. Vigna (2018), "Scrambled linear pseudorandom
  number generators" (ACM TOMS 47(4), 2021). Output rotl(s1 * 5, 7) * 9.
* Bounded integers: D. Lemire (2019), "Fast random integer generation in an
  interval", ACM TOMACS 29(1). 32-bit multiply-shift with rejection, fed with the
  upper 32 bits of each 64-bit output.
* StreamSeed.Derive: the formula documented in src/DesignCompiler/Randomness/StreamSeed.cs.

Run:  python3 rng_reference.py
"""

MASK = (1 << 64) - 1
GAMMA = 0x9E3779B97F4A7C15


def mix64(z):
    z = ((z ^ (z >> 30)) * 0xBF58476D1CE4E5B9) & MASK
    z = ((z ^ (z >> 27)) * 0x94D049BB133111EB) & MASK
    return z ^ (z >> 31)


class SplitMix64:
    def __init__(self, seed):
        self.state = seed & MASK

    def next(self):
        self.state = (self.state + GAMMA) & MASK
        return mix64(self.state)


def rotl(x, k):
    return ((x << k) | (x >> (64 - k))) & MASK


class Xoshiro256StarStar:
    def __init__(self, seed=None, state=None):
        if state is None:
            sm = SplitMix64(seed)
            state = [sm.next() for _ in range(4)]
        self.s = list(state)

    def next(self):
        s = self.s
        result = (rotl((s[1] * 5) & MASK, 7) * 9) & MASK
        t = (s[1] << 17) & MASK
        s[2] ^= s[0]
        s[3] ^= s[1]
        s[1] ^= s[2]
        s[0] ^= s[3]
        s[2] ^= t
        s[3] = rotl(s[3], 45)
        return result

    def next_double(self):
        return (self.next() >> 11) * (1.0 / (1 << 53))

    def next_int(self, bound):
        x = self.next() >> 32
        m = x * bound
        low = m & 0xFFFFFFFF
        if low < bound:
            threshold = ((1 << 32) - bound) % bound
            while low < threshold:
                x = self.next() >> 32
                m = x * bound
                low = m & 0xFFFFFFFF
        return m >> 32


def fisher_yates(items, rng):
    """Durstenfeld's in-place form: j from n-1 down to 1, swap j with next_int(j + 1)."""
    items = list(items)
    for j in range(len(items) - 1, 0, -1):
        k = rng.next_int(j + 1)
        items[j], items[k] = items[k], items[j]
    return items


def derive(seed, a, b=0, c=0, d=0):
    h = mix64((seed + GAMMA) & MASK)
    for x in (a, b, c, d):
        h = mix64(((h ^ x) + GAMMA) & MASK)
    return h


def main():
    print("SplitMix64")
    for seed in (0, 1234567, 0xFFFFFFFFFFFFFFFF):
        sm = SplitMix64(seed)
        print(f"  seed {seed}: " + ", ".join(f"0x{sm.next():016X}UL" for _ in range(5)))

    print("xoshiro256** from raw state (1, 2, 3, 4)")
    x = Xoshiro256StarStar(state=[1, 2, 3, 4])
    print("  " + ", ".join(f"0x{x.next():016X}UL" for _ in range(6)))

    print("xoshiro256** seeded through SplitMix64")
    for seed in (0, 42, 20240601):
        x = Xoshiro256StarStar(seed=seed)
        print(f"  seed {seed}: " + ", ".join(f"0x{x.next():016X}UL" for _ in range(5)))

    print("NextDouble, seed 42 (repr, 17 significant digits)")
    x = Xoshiro256StarStar(seed=42)
    print("  " + ", ".join(f"{x.next_double():.17g}" for _ in range(4)))

    print("NextInt, seed 7")
    for bound in (1, 6, 1000, 1500000000):
        x = Xoshiro256StarStar(seed=7)
        print(f"  bound {bound}: " + ", ".join(str(x.next_int(bound)) for _ in range(8)))

    print("Fisher-Yates of 0..9")
    for seed in (2024, 1):
        print(f"  seed {seed}: " + ", ".join(str(v) for v in fisher_yates(range(10), Xoshiro256StarStar(seed=seed))))

    print("Fisher-Yates of 0..9 on the stream Derive(42, 1, 2)")
    print("  " + ", ".join(str(v) for v in fisher_yates(range(10), Xoshiro256StarStar(seed=derive(42, 1, 2)))))

    print("StreamSeed.Derive")
    for args in ((0, 0), (42, 1), (42, 1, 2), (42, 1, 2, 3, 4), (42, 2, 1), (0xFFFFFFFFFFFFFFFF, 7, 0, 5)):
        print(f"  Derive{args}: 0x{derive(*args):016X}UL")


if __name__ == "__main__":
    main()
