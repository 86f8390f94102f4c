package org.faultbench.core.fuzz;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Seeded mutations of valid example files, aimed at what breaks readers: flipped bytes, deleted and duplicated
 * tokens and lines, numbers replaced by NaN, infinities, extremes and huge counts, truncation and splicing of two
 * inputs. The same random source gives the same input, so every failure can be replayed from its seed.
 */
public final class Mutator {
    private static final Pattern NUMBER = Pattern.compile("[-+]?\\d+(\\.\\d*)?([eE][-+]?\\d+)?");
    private static final String[] NUMBERS = {"NaN", "nan", "Infinity", "-Infinity", "inf", "1e308", "-1e308",
        "1e400", "-0", "0", "-1", "1e-320", "2147483647", "2147483648", "-2147483648", "9223372036854775807",
        "99999999999999999999", "4294967296", "65536", "100000", "1000000000", "0.0", "1.0E+30", "-999.25",
        "0x10", "1e", ".", "-", "1,5"};
    private static final String[] SNIPPETS = {"\n", "\r\n", "\r", "\t", " ", ",", ";", ":", ".", "\"", "'", "{",
        "}", "[", "]", "(", ")", "~", "@", "!", "#", "\\", "\u0000", "\uFFFD", "null", "true", "EMPTY", "~A",
        "~C", "~W", "~V"};
    private static final int MAX_LENGTH = 1 << 16;

    private Mutator() {
    }

    /** One to four stacked mutations of a seed input chosen by {@code random}. */
    public static byte[] mutate(List<byte[]> seeds, SplittableRandom random) {
        // Latin-1 maps bytes to chars one to one, so text operations keep arbitrary bytes
        String text = latin1(seeds.get(random.nextInt(seeds.size())));
        int rounds = 1 + random.nextInt(4);
        for (int r = 0; r < rounds; r++) {
            text = mutateOnce(text, seeds, random);
            if (text.length() > MAX_LENGTH) {
                text = text.substring(0, MAX_LENGTH);
            }
        }
        return text.getBytes(StandardCharsets.ISO_8859_1);
    }

    private static String mutateOnce(String text, List<byte[]> seeds, SplittableRandom random) {
        int length = text.length();
        int at = length == 0 ? 0 : random.nextInt(length);
        switch (random.nextInt(10)) {
            case 0: { // flip a bit
                if (length == 0) {
                    return text;
                }
                char c = (char) ((text.charAt(at) ^ (1 << random.nextInt(8))) & 0xFF);
                return text.substring(0, at) + c + text.substring(at + 1);
            }
            case 1: // insert a byte or snippet
                return text.substring(0, at) + (random.nextBoolean() ? String.valueOf((char) random.nextInt(256))
                        : SNIPPETS[random.nextInt(SNIPPETS.length)]) + text.substring(at);
            case 2:
            case 3:
                return replaceNumber(text, random);
            case 4: { // delete a token
                int[] token = token(text, at);
                return text.substring(0, token[0]) + text.substring(token[1]);
            }
            case 5: { // duplicate a token
                int[] token = token(text, at);
                return text.substring(0, token[1]) + " " + text.substring(token[0], token[1])
                        + text.substring(token[1]);
            }
            case 6: { // delete or duplicate a line
                int start = text.lastIndexOf('\n', Math.max(0, at - 1)) + 1;
                int end = text.indexOf('\n', at);
                end = end < 0 ? length : end + 1;
                String line = text.substring(start, end);
                return random.nextBoolean() ? text.substring(0, start) + text.substring(end)
                        : text.substring(0, end) + line.repeat(1 + random.nextInt(3)) + text.substring(end);
            }
            case 7: // truncate
                return text.substring(0, at);
            case 8: { // splice with another input
                String other = latin1(seeds.get(random.nextInt(seeds.size())));
                int from = other.isEmpty() ? 0 : random.nextInt(other.length());
                return text.substring(0, at) + other.substring(from);
            }
            default: { // repeat a chunk (deep nesting, long lines)
                int end = Math.min(length, at + 1 + random.nextInt(16));
                return text.substring(0, end) + text.substring(at, end).repeat(random.nextInt(64))
                        + text.substring(end);
            }
        }
    }

    private static String replaceNumber(String text, SplittableRandom random) {
        List<int[]> spans = new ArrayList<>();
        Matcher m = NUMBER.matcher(text);
        while (m.find()) {
            spans.add(new int[] {m.start(), m.end()});
        }
        if (spans.isEmpty()) {
            return text;
        }
        int[] span = spans.get(random.nextInt(spans.size()));
        return text.substring(0, span[0]) + NUMBERS[random.nextInt(NUMBERS.length)] + text.substring(span[1]);
    }

    /** Start and end of the run of non-separator characters around {@code at}. */
    private static int[] token(String text, int at) {
        int start = at;
        while (start > 0 && !separator(text.charAt(start - 1))) {
            start--;
        }
        int end = at;
        while (end < text.length() && !separator(text.charAt(end))) {
            end++;
        }
        return new int[] {start, Math.max(start, end)};
    }

    private static boolean separator(char c) {
        return Character.isWhitespace(c) || ",;:[]{}()\"".indexOf(c) >= 0;
    }

    static String latin1(byte[] bytes) {
        return new String(bytes, StandardCharsets.ISO_8859_1);
    }
}
