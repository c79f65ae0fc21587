import type { ColumnPick } from '../data/community-import.ts';
import type { TextKey } from '../text/text-key.ts';
import type { Translator } from '../text/translator.ts';

/**
 * Asks which of the file's columns holds each field that was not recognised by its name, and
 * sends the file back with the choice (carried in the form when small enough, else chosen again).
 */
export function ColumnPickForm(props: {
  readonly tr: Translator;
  readonly action: string;
  readonly pick: ColumnPick;
  /** Other fields of the form the file came with (a new study's name), sent again. */
  readonly hidden?: Readonly<Record<string, string>>;
}) {
  const { tr, pick } = props;
  return (
    <form
      method="post"
      action={props.action}
      enctype="multipart/form-data"
      class="column-pick"
      data-pick={pick.fileName}
    >
      <fieldset>
        <legend>{tr.text('editor.pick.legend', { file: pick.fileName })}</legend>
        {Object.entries(props.hidden ?? {}).map(([name, value]) => (
          <input type="hidden" name={name} value={value} />
        ))}
        <p class="help">{tr.text('editor.pick.help')}</p>
        {Object.entries(pick.chosen).map(([key, column]) =>
          pick.missing.includes(key as never) || column === undefined ? null : (
            <input type="hidden" name={`column.${key}`} value={column} />
          ),
        )}
        {pick.missing.map((key) => (
          <div class="field">
            <label for={`pick-${key}`}>{tr.text(`editor.pick.field.${key}` as TextKey)}</label>
            <select id={`pick-${key}`} name={`column.${key}`}>
              <option value="">{tr.text('editor.pick.none')}</option>
              {pick.columns.map((column) => (
                <option value={column} selected={pick.chosen[key] === column}>
                  {column}
                </option>
              ))}
            </select>
          </div>
        ))}
        {pick.fileData !== undefined ? (
          <>
            <input type="hidden" name="fileName" value={pick.fileName} />
            <input type="hidden" name="fileData" value={pick.fileData} />
          </>
        ) : (
          <div class="field">
            <label for="pick-file">{tr.text('editor.pick.fileAgain')}</label>
            <input id="pick-file" name="file" type="file" />
          </div>
        )}
      </fieldset>
      <button type="submit">{tr.text('editor.pick.button')}</button>
    </form>
  );
}
