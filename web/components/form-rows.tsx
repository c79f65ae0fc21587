import type { Child } from 'hono/jsx';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/** One labelled control of a form: label, the control (children), and what follows it. */
export function Field(props: {
  /** The control's id, which the label names. */
  readonly id: string;
  readonly label: Child;
  /** Marks the row when its value was refused. */
  readonly bad?: boolean;
  readonly children?: Child;
}) {
  return (
    <div class={props.bad ? 'field field-bad' : 'field'}>
      <label for={props.id}>{props.label}</label>
      {props.children}
    </div>
  );
}

/** A decimal number typed in (the form field `name`) under its label; help and problems follow (children). */
export function NumberField(props: {
  readonly id: string;
  /** The id of the help among the children, if any. */
  readonly helpId?: string;
  readonly name: string;
  readonly label: Child;
  /** The input's min, max and step. */
  readonly range: { readonly min: string; readonly max: string; readonly step: string };
  readonly value: string;
  /** The id of the problems among the children, when the value was refused. */
  readonly problemId: string | undefined;
  readonly children?: Child;
}) {
  const { range, problemId } = props;
  return (
    <Field id={props.id} label={props.label}>
      <input
        id={props.id}
        name={props.name}
        type="number"
        min={range.min}
        max={range.max}
        step={range.step}
        inputmode="decimal"
        value={props.value}
        aria-describedby={[props.helpId, problemId].filter(Boolean).join(' ') || undefined}
        aria-invalid={problemId === undefined ? undefined : 'true'}
      />
      {props.children}
    </Field>
  );
}

/** The files each upload takes, as the browser's file picker offers them. */
const UPLOAD_TYPES = {
  communities: '.csv,.txt,.tsv,.xlsx,.kml,.kmz,.zip,.geojson,.json',
  sources: '.geojson,.json,application/geo+json,application/json',
  catalog: '.csv,.txt,.xml,.quakeml',
  faults: '.geojson,.json,.kml,.kmz,.zip',
} as const;

export interface FileFieldProps {
  readonly tr: Translator;
  /** Which upload: its ids are `<upload>-file`, `<upload>-help` and `<upload>-problems`. */
  readonly upload: keyof typeof UPLOAD_TYPES;
  readonly text: { readonly label: TextKey; readonly help: TextKey };
  /** The last file's problems are shown (children). */
  readonly problems?: boolean;
  readonly bad?: boolean;
  readonly children?: Child;
}

/** A file to upload (the form field `file`): label, input, help, and the last file's problems. */
export function FileField(props: FileFieldProps) {
  const { tr, upload } = props;
  const id = `${upload}-file`;
  const helpId = `${upload}-help`;
  return (
    <Field id={id} label={tr.text(props.text.label)} bad={props.bad}>
      <input
        id={id}
        name="file"
        type="file"
        accept={UPLOAD_TYPES[upload]}
        aria-describedby={props.problems ? `${helpId} ${upload}-problems` : helpId}
        aria-invalid={props.problems ? 'true' : undefined}
      />
      <p id={helpId} class="help">
        {tr.text(props.text.help)}
      </p>
      {props.children}
    </Field>
  );
}

/** An editor form's closing line: the button that saves, and a way back to the study's editor. */
export function FormActions(props: {
  readonly tr: Translator;
  readonly studyId: string;
  readonly save: TextKey;
}) {
  return (
    <p class="form-actions">
      <button type="submit" class="button-primary">
        {props.tr.text(props.save)}
      </button>{' '}
      <a href={`/studies/${props.studyId}/edit`}>{props.tr.text('editor.cancel')}</a>
    </p>
  );
}
