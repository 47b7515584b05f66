/*
 * Reference loop for the engine bench: the same pattern classification as
 * shared/engine/patterns.ts (patternMask), written plainly in C, digit by digit.
 * Usage: classify FIRST COUNT LOW_LIMIT [plain|tables]
 * `plain` (the default) is the reference the issue asks for; `tables` uses the
 * engine's own half-serial lookup tables, a stricter comparison.
 * Prints one JSON line: elapsed nanoseconds and the tally of pattern masks
 * (bit order = PATTERN_IDS: solid, ladder, radar, repeater, super-repeater,
 * rotator, binary, trinary, low, high, super-radar, true-binary), so the bench can check that both
 * loops agree as well as time them.
 */
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

enum {
  SOLID = 1, LADDER = 2, RADAR = 4, REPEATER = 8, SUPER_REPEATER = 16,
  ROTATOR = 32, BINARY = 64, TRINARY = 128, LOW = 256, HIGH = 512,
  SUPER_RADAR = 1024, TRUE_BINARY = 2048
};
#define MASKS 4096

static const int TURN[10] = {0, 1, -1, -1, -1, -1, 9, -1, 8, 6};

static unsigned classify(unsigned value, unsigned low_limit) {
  int d[8];
  unsigned v = value;
  for (int i = 7; i >= 0; i--) {
    d[i] = (int)(v % 10);
    v /= 10;
  }
  unsigned seen = 0;
  for (int i = 0; i < 8; i++) seen |= 1u << d[i];
  int distinct = __builtin_popcount(seen);
  unsigned mask = 0;
  if (distinct == 1) mask |= SOLID;
  else if (distinct == 2) mask |= BINARY;
  else if (distinct == 3) mask |= TRINARY;

  int up = 1, down = 1;
  for (int i = 1; i < 8; i++) {
    if (d[i] != d[i - 1] + 1) up = 0;
    if (d[i] != d[i - 1] - 1) down = 0;
  }
  if (up || down) mask |= LADDER;

  int radar = 1, repeater = 1, rotator = 1;
  for (int i = 0; i < 4; i++) {
    if (d[i] != d[7 - i]) radar = 0;
    if (d[i] != d[i + 4]) repeater = 0;
  }
  for (int i = 0; i < 8; i++) {
    if (TURN[d[i]] < 0 || TURN[d[7 - i]] != d[i]) {
      rotator = 0;
      break;
    }
  }
  if (radar) mask |= RADAR;
  if (repeater) {
    mask |= REPEATER;
    if (d[0] == d[2] && d[1] == d[3]) mask |= SUPER_REPEATER;
  }
  if (rotator) mask |= ROTATOR;
  if (value <= low_limit) mask |= LOW;
  if (value >= 99990000u) mask |= HIGH;
  /* super radar: d1 = d8 = a, the six inner digits one digit b, a != b */
  int inner = 1;
  for (int i = 2; i < 7; i++) if (d[i] != d[1]) inner = 0;
  if (inner && d[0] == d[7] && d[0] != d[1]) mask |= SUPER_RADAR;
  /* true binary: only 0s and 1s, both present */
  if (seen == 3u) mask |= TRUE_BINARY;
  return mask;
}

static unsigned short digit_mask[10000], reversed[10000];
static short turned[10000];

static void build_tables(void) {
  for (int h = 0; h < 10000; h++) {
    int a = h / 1000, b = h / 100 % 10, c = h / 10 % 10, d = h % 10;
    digit_mask[h] = (unsigned short)((1u << a) | (1u << b) | (1u << c) | (1u << d));
    reversed[h] = (unsigned short)(d * 1000 + c * 100 + b * 10 + a);
    int ta = TURN[a], tb = TURN[b], tc = TURN[c], td = TURN[d];
    turned[h] = (short)((ta < 0 || tb < 0 || tc < 0 || td < 0) ? -1 : td * 1000 + tc * 100 + tb * 10 + ta);
  }
}

static unsigned classify_tables(unsigned value, unsigned low_limit) {
  unsigned hi = value / 10000, lo = value - hi * 10000;
  unsigned seen = digit_mask[hi] | digit_mask[lo];
  int distinct = __builtin_popcount(seen);
  unsigned mask = 0;
  if (distinct == 1) mask = SOLID;
  else if (distinct == 2) {
    mask = seen == 3u ? BINARY | TRUE_BINARY : BINARY;
    if (reversed[hi] == lo && (hi % 1000) % 111 == 0) mask |= SUPER_RADAR;
  }
  else if (distinct == 3) mask = TRINARY;
  else if (distinct == 8 && (value == 12345678u || value == 23456789u || value == 1234567u ||
                              value == 98765432u || value == 87654321u || value == 76543210u)) mask = LADDER;
  if (reversed[hi] == lo) mask |= RADAR;
  if (hi == lo) {
    mask |= REPEATER;
    if (hi % 101 == 0) mask |= SUPER_REPEATER;
  }
  if (turned[hi] == (int)lo) mask |= ROTATOR;
  if (value <= low_limit) mask |= LOW;
  if (value >= 99990000u) mask |= HIGH;
  return mask;
}

int main(int argc, char **argv) {
  if (argc != 4 && argc != 5) {
    fprintf(stderr, "usage: %s FIRST COUNT LOW_LIMIT [plain|tables]\n", argv[0]);
    return 2;
  }
  int use_tables = argc == 5 && argv[4][0] == 't';
  if (use_tables) build_tables();
  unsigned first = (unsigned)strtoul(argv[1], NULL, 10);
  unsigned count = (unsigned)strtoul(argv[2], NULL, 10);
  unsigned low_limit = (unsigned)strtoul(argv[3], NULL, 10);
  static unsigned long long tally[MASKS];
  struct timespec start, end;
  clock_gettime(CLOCK_MONOTONIC, &start);
  if (use_tables) {
    for (unsigned v = first; v < first + count; v++) tally[classify_tables(v, low_limit)]++;
  } else {
    for (unsigned v = first; v < first + count; v++) tally[classify(v, low_limit)]++;
  }
  clock_gettime(CLOCK_MONOTONIC, &end);
  long long ns = (long long)(end.tv_sec - start.tv_sec) * 1000000000LL + (end.tv_nsec - start.tv_nsec);
  printf("{\"ns\":%lld,\"count\":%u,\"tally\":[", ns, count);
  for (int m = 0; m < MASKS; m++) printf(m ? ",%llu" : "%llu", tally[m]);
  printf("]}\n");
  return 0;
}
