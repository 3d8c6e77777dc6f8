import { useEffect, useState } from 'react';
import { Button, Callout, Dialog, DialogBody, DialogFooter, HTMLTable, Intent, Tag, TextArea } from '@blueprintjs/core';
import { ApiError } from '../../../lib/api-client';
import { useRule } from '../api/get-rule';
import { useRuleVersions } from '../api/get-rule-versions';
import { useCreateRule } from '../api/create-rule';
import { VERDICT_LOOK } from '../../../components/verdict-look';
import { usePreviewRule } from '../api/preview-rule';
import { useUpdateRule } from '../api/update-rule';
import { useValidateRule } from '../api/validate-rule';
import type { RulePreview, RuleProblem } from '../types';

export interface RuleEditorDialogProps {
  /** The rule to edit; null starts a new one. */
  ruleId: string | null;
  onClose: () => void;
}

const NEW_RULE = {
  id: 'my-new-rule',
  title: 'Describe what the rule checks',
  description: 'Why it matters, in a sentence or two.',
  severity: 'marginal',
  enabled: true,
  version: 1,
  source: 'Name the standard or book the threshold comes from, or say "common practice"',
  parameters: { maxVswr: 2.5 },
  conditions: { all: [{ fact: 'worstVswr', operator: 'greaterThan', value: { param: 'maxVswr' } }] },
  event: { type: 'finding', params: { code: 'MY_NEW_RULE', message: 'worst VSWR {worstVswr}:1 at {worstVswrAtMhz} MHz; the limit is {maxVswr}:1' } },
};

function parse(text: string): { value: unknown; problem: RuleProblem | null } {
  try {
    return { value: JSON.parse(text), problem: null };
  } catch (error) {
    return { value: null, problem: { path: '', message: `not valid JSON: ${(error as Error).message}` } };
  }
}

/** Edit a rule as JSON: validate, preview which matrix cells would change, then save a new version. */
export function RuleEditorDialog({ ruleId, onClose }: RuleEditorDialogProps) {
  const rule = useRule(ruleId);
  const versions = useRuleVersions(ruleId);
  const [text, setText] = useState(ruleId === null ? JSON.stringify(NEW_RULE, null, 2) : '');
  const [problems, setProblems] = useState<RuleProblem[] | null>(null);
  const [preview, setPreview] = useState<RulePreview | null>(null);
  const validate = useValidateRule();
  const previewRule = usePreviewRule();
  const create = useCreateRule();
  const update = useUpdateRule();

  useEffect(() => {
    if (rule.data) setText(JSON.stringify(rule.data.definition, null, 2));
  }, [rule.data]);

  const withParsed = (run: (value: unknown) => void) => {
    const { value, problem } = parse(text);
    if (problem) setProblems([problem]);
    else run(value);
  };
  const showError = (error: Error) => {
    const fields = error instanceof ApiError ? Object.entries(error.fieldErrors).map(([path, message]) => ({ path, message })) : [];
    setProblems(fields.length > 0 ? fields : [{ path: '', message: error.message }]);
  };
  const onValidate = () => withParsed((value) => validate.mutate(value, { onSuccess: (r) => setProblems(r.problems), onError: showError }));
  const onPreview = () =>
    withParsed((value) =>
      previewRule.mutate(value, {
        onSuccess: (p) => {
          setPreview(p);
          setProblems([]);
        },
        onError: showError,
      }),
    );
  const onSave = () =>
    withParsed((value) => {
      if (ruleId === null) create.mutate(value, { onSuccess: onClose, onError: showError });
      else update.mutate({ id: ruleId, definition: value, version: rule.data!.version }, { onSuccess: onClose, onError: showError });
    });

  return (
    <Dialog isOpen onClose={onClose} title={ruleId === null ? 'New rule' : `Edit rule ${ruleId}`} icon="code" style={{ width: 'min(980px, 96vw)' }}>
      <DialogBody>
        <p className="bw-muted">
          The rule is json-rules-engine JSON over Bandwright&apos;s facts. A value written as {'{"param": "name"}'} takes a parameter; a table parameter needs
          {' {"param": "name", "key": "technology"}'} and a &quot;default&quot; entry. Placeholders such as {'{worstVswr}'} in the message are filled with the
          numbers.
        </p>
        <TextArea
          fill
          value={text}
          onChange={(e) => setText(e.target.value)}
          rows={22}
          style={{ fontFamily: 'monospace', fontSize: 12 }}
          aria-label="Rule JSON"
        />
        {problems !== null && problems.length === 0 && !preview && (
          <Callout intent={Intent.SUCCESS} icon="tick" className="bw-gap">
            The rule is valid.
          </Callout>
        )}
        {problems !== null && problems.length > 0 && (
          <Callout intent={Intent.DANGER} icon="error" title="The rule cannot be saved" className="bw-gap" data-testid="rule-problems">
            <ul>
              {problems.map((p) => (
                <li key={p.path + p.message}>
                  <code>{p.path || 'rule'}</code>: {p.message}
                </li>
              ))}
            </ul>
          </Callout>
        )}
        {preview && (
          <Callout
            intent={preview.changes.length ? Intent.WARNING : Intent.NONE}
            icon="eye-open"
            title={`${preview.changes.length} of ${preview.cellsCompared} matrix cells would change`}
            className="bw-gap"
            data-testid="rule-preview"
          >
            {preview.changes.length > 0 && (
              <HTMLTable compact>
                <thead>
                  <tr>
                    <th>Product</th>
                    <th>Radio band</th>
                    <th>Part</th>
                    <th>Now</th>
                    <th>After</th>
                    <th>Finding</th>
                  </tr>
                </thead>
                <tbody>
                  {preview.changes.slice(0, 50).map((c) => (
                    <tr key={`${c.productId}-${c.radioId}-${c.bandId}-${c.partId}`}>
                      <td>{c.productName}</td>
                      <td>
                        {c.designation} · {c.radioName}
                      </td>
                      <td>{c.mpn}</td>
                      <td>
                        <Tag minimal intent={VERDICT_LOOK[c.before].intent}>
                          {VERDICT_LOOK[c.before].label}
                        </Tag>
                      </td>
                      <td>
                        <Tag minimal intent={VERDICT_LOOK[c.after].intent}>
                          {VERDICT_LOOK[c.after].label}
                        </Tag>
                      </td>
                      <td>{c.findings.join('; ')}</td>
                    </tr>
                  ))}
                </tbody>
              </HTMLTable>
            )}
          </Callout>
        )}
        {versions.data && versions.data.length > 0 && (
          <p className="bw-muted">
            History:{' '}
            {versions.data
              .map((v) => `v${v.version} ${v.action}${v.changedBy ? ` by ${v.changedBy}` : ''}${v.at ? ` ${new Date(v.at).toLocaleString()}` : ''}`)
              .join(' · ')}
          </p>
        )}
      </DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Validate" icon="tick" loading={validate.isPending} onClick={onValidate} />
            <Button text="Preview impact" icon="eye-open" loading={previewRule.isPending} onClick={onPreview} />
            <Button text="Save" icon="floppy-disk" intent={Intent.PRIMARY} loading={create.isPending || update.isPending} onClick={onSave} />
          </>
        }
      />
    </Dialog>
  );
}
