import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, test } from 'vitest';
import { Field } from './field';

// WAI-ARIA 1.2: aria-invalid marks a field whose value failed its check, and aria-describedby names the element
// that describes it — here the error message — so assistive technology reads the two together.
describe('a form field', () => {
  test('with an error, the input is marked invalid and described by the message', () => {
    const html = renderToStaticMarkup(
      <Field id="length" label="Length" error="Type a length, e.g. 19 3/4">
        <input id="length" />
      </Field>,
    );
    expect(html).toContain('<label for="length" class="field-label">Length</label>');
    expect(html).toMatch(/<input id="length" aria-invalid="true" aria-describedby="length-error"\/>/);
    expect(html).toContain('<p id="length-error" class="field-error" role="alert">Type a length, e.g. 19 3/4</p>');
  });

  test('without one, the input is left as it is and no message is shown', () => {
    const html = renderToStaticMarkup(
      <Field id="width" label="Width">
        <input id="width" />
      </Field>,
    );
    expect(html).toContain('<input id="width"/>');
    expect(html).not.toMatch(/aria-invalid|role="alert"/);
  });
});
