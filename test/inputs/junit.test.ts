import { describe, expect, it } from 'vitest';
import { readJunit } from '../../src/inputs/junit.js';
import { InputError } from '../../src/errors/input-error.js';
import { inputErrorOf } from './helpers.js';

describe('readJunit', () => {
  it('reads a single root <testsuite> and drops a classname equal to the suite name', () => {
    const result = readJunit(
      '<testsuite name="s" time="2"><testcase classname="s" name="t" time="1.5"/></testsuite>',
      'j.xml',
    );
    expect(result.readings).toEqual([
      { name: 's', value: 2, unit: 's', where: 'j.xml:/testsuite' },
      { name: 's/t', value: 1.5, unit: 's', where: 'j.xml:/testsuite/testcase' },
    ]);
  });

  it('reads test cases placed straight under <testsuites>', () => {
    const result = readJunit('<testsuites><testcase classname="C" name="t" time="0.25"/></testsuites>', 'j.xml');
    expect(result.readings).toEqual([{ name: 'C/t', value: 0.25, unit: 's', where: 'j.xml:/testsuites/testcase' }]);
  });

  it('names file:line:col of malformed XML', () => {
    const error = inputErrorOf(() => readJunit('<testsuites>\n  <testsuite name="a">\n</testsuites>', 'j.xml'));
    expect(error.message).toMatch(/malformed XML/);
    expect(error.where).toMatch(/^j\.xml:3:\d+$/);
  });

  it('names the element path of a bad time', () => {
    const text =
      '<testsuites><testsuite name="a"><testcase name="x" time="1"/><testcase name="y" time="1,5"/></testsuite></testsuites>';
    const error = inputErrorOf(() => readJunit(text, 'j.xml'));
    expect(error.where).toBe('j.xml:/testsuites/testsuite/testcase[2]@time');
    expect(
      inputErrorOf(() => readJunit('<testsuite name="a"><testcase name="x" time="-1"/></testsuite>', 'j.xml')).message,
    ).toMatch(/negative/);
  });

  it('refuses a test case without a name and XML that is not a JUnit report', () => {
    expect(inputErrorOf(() => readJunit('<testsuite name="a"><testcase time="1"/></testsuite>', 'j.xml')).where).toBe(
      'j.xml:/testsuite/testcase',
    );
    expect(inputErrorOf(() => readJunit('<html><body/></html>', 'j.xml')).message).toMatch(
      /no <testsuites> or <testsuite>/,
    );
  });

  it('limits entity expansion (a "billion laughs" document is refused, not expanded)', () => {
    const lol =
      '<!DOCTYPE t [<!ENTITY a "aaaaaaaaaa">' +
      Array.from({ length: 8 }, (_, i) => `<!ENTITY b${i} "${`&${i === 0 ? 'a' : `b${i - 1}`};`.repeat(10)}">`).join(
        '',
      ) +
      ']>';
    const text = `${lol}<testsuite name="&b7;" time="1"/>`;
    // Expanded, the name would be 10^9 characters; it must come back short or as an InputError.
    let length = -1;
    try {
      length = readJunit(text, 'j.xml').readings[0]!.name.length;
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      length = 0;
    }
    expect(length).toBeGreaterThanOrEqual(0);
    expect(length).toBeLessThan(1000);
  });
});
