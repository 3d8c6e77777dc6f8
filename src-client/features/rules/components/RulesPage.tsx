import { useState } from 'react';
import { Button, HTMLTable, Intent, OverlayToaster, Position, Switch, Tag } from '@blueprintjs/core';
import { PageHeader } from '../../../components/PageHeader';
import { QueryState } from '../../../components/QueryState';
import { ScreeningCaution } from '../../../components/ScreeningCaution';
import { useHasRole } from '../../../lib/session';
import { useRules } from '../api/get-rules';
import { useSetRuleEnabled } from '../api/set-rule-enabled';
import type { RuleSummary } from '../types';
import { RuleEditorDialog } from './RuleEditorDialog';

const toaster = OverlayToaster.createAsync({ position: Position.TOP });

const SEVERITY_INTENT: Record<RuleSummary['severity'], Intent> = { fail: Intent.DANGER, marginal: Intent.WARNING, info: Intent.PRIMARY };
const ORIGIN_LABEL: Record<RuleSummary['origin'], string> = { file: 'rule file', 'file-edited': 'rule file, edited', admin: 'made by an admin' };

/** The rule set the matrix is judged by; admins enable, disable, edit and add rules here. */
export function RulesPage() {
  const rules = useRules();
  const isAdmin = useHasRole('admin');
  const setEnabled = useSetRuleEnabled();
  const [editing, setEditing] = useState<string | 'new' | null>(null);
  return (
    <>
      <PageHeader
        title="Rules"
        subtitle="Each rule turns facts of a radio band and a part into a finding; a cell takes its worst finding, and missing data gives no data, never a pass."
        actions={isAdmin && <Button icon="add" intent={Intent.PRIMARY} text="New rule" onClick={() => setEditing('new')} />}
      />
      <ScreeningCaution compact />
      <QueryState isPending={rules.isPending} error={rules.error}>
        <HTMLTable compact striped interactive style={{ width: '100%' }} data-testid="rules">
          <thead>
            <tr>
              <th>Rule</th>
              <th>Severity</th>
              <th>Threshold source</th>
              <th>Origin</th>
              <th>Version</th>
              <th>Enabled</th>
              {isAdmin && <th />}
            </tr>
          </thead>
          <tbody>
            {(rules.data ?? []).map((rule) => (
              <tr key={rule.id} data-testid={`rule-${rule.id}`}>
                <td>
                  <b>{rule.title}</b>
                  <div className="bw-muted">
                    {rule.id} · {rule.description}
                  </div>
                </td>
                <td>
                  <Tag intent={SEVERITY_INTENT[rule.severity]}>{rule.severity}</Tag>
                </td>
                <td className="bw-muted">{rule.source}</td>
                <td>{ORIGIN_LABEL[rule.origin]}</td>
                <td>{rule.version}</td>
                <td>
                  <Switch
                    checked={rule.enabled}
                    disabled={!isAdmin || setEnabled.isPending}
                    aria-label={`${rule.enabled ? 'Disable' : 'Enable'} ${rule.title}`}
                    onChange={() =>
                      setEnabled.mutate(
                        { id: rule.id, enabled: !rule.enabled, version: rule.version },
                        { onError: (e) => toaster.then((t) => t.show({ intent: Intent.DANGER, message: e.message })) },
                      )
                    }
                  />
                </td>
                {isAdmin && (
                  <td>
                    <Button small icon="edit" text="Edit" onClick={() => setEditing(rule.id)} />
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </QueryState>
      {editing !== null && <RuleEditorDialog ruleId={editing === 'new' ? null : editing} onClose={() => setEditing(null)} />}
    </>
  );
}
