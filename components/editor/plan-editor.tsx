'use client';

import dynamic from 'next/dynamic';
import Link from 'next/link';
import { useCallback, useEffect, useMemo, useReducer, useRef, useState } from 'react';
import { planLabels } from '@/lib/plan/labels';
import { findNode, findRoom, findRun, findSegment, normalizeState, runOfNode, runOfSegment, snapToGrid, type Point } from '@/lib/plan';
import { formatLength, gridStepWords } from '@/lib/plan/units';
import type { PlanView } from '@/lib/plans/data';
import type { UnitSystem } from '@/models/user';
import { CommentPins, CommentsPanel, CommentsProvider, useComments, type PinView } from '@/components/comments/plan-comments';
import { PlanRevisionActions } from '@/components/revisions/plan-revision-actions';
import { UnitSystemToggle } from '@/components/shell/unit-system-toggle';
import type { RevisionSummary } from '@/lib/revisions/types';
import { BackgroundUpload } from './background-upload';
import { planBackgroundOf } from './canvas/plan-background';
import { useDxfDrawing } from './canvas/use-dxf-drawing';
import { DrawingLayersPanel } from './drawing-layers-panel';
import { useHiddenLayers } from './use-hidden-layers';
import { ConflictDialog } from './dialogs/conflict-dialog';
import { HelpOverlay } from './dialogs/help-overlay';
import { ScaleDialog } from './dialogs/scale-dialog';
import { editorReducer, editRefusal, initialModel, runCommand } from './editor-model';
import { EndPanel } from './panels/end-panel';
import { ResultsPanel } from './panels/results-panel';
import { OutletReflectionLossTable } from './results/outlet-reflection-loss-table';
import { RunPanel } from './panels/run-panel';
import { SegmentPanel } from './panels/segment-panel';
import { wallWords } from './panels/walls-field';
import { SaveStatusLabel } from './save-status';
import { ScheduleCsvControls } from './schedule-csv-controls';
import { ToolStrip } from './tool-strip';
import { mayUseTool, TOOLS, type ToolName } from './tools';
import { useAutosave } from './use-autosave';
import { planGrid, useCanvasTools, type PlanGrid } from './use-canvas-tools';
import { useModeEnvelope } from './use-mode-envelope';
import { usePlanResults } from './use-plan-results';
import { usePlanRisks } from './use-plan-risks';
import { RiskDrawer } from './risk/risk-drawer';
import { RoomPanel } from './rooms/room-panel';
import { NoiseSheet } from './rooms/noise-sheet';
import { noiseTables } from '@/lib/plans/noise-path/path-tables';
import { useRoomActions } from './rooms/use-room-actions';
import { useEditorKeys } from './use-editor-keys';
import { useElementSize } from './use-element-size';

const PlanCanvas = dynamic(() => import('./canvas/plan-canvas'), { ssr: false, loading: () => <p className="p-4 text-sm text-graphite-500">Loading the canvas…</p> });

// canEvaluate: may open a flag's candidate treatments (analysis.run); defaults to editable.
export interface PlanEditorProps {
  plan: PlanView;
  editable: boolean;
  unitSystem: UnitSystem;
  canEvaluate?: boolean;
  // The plan's latest revision and what this person may do with revisions.
  revisions: { latest: RevisionSummary | null; canSubmit: boolean; canIssue: boolean };
  // Comment pins and threads on the live plan.
  comments: { canWrite: boolean; members: string[]; initialActiveId: string | null };
}

export function PlanEditor(props: PlanEditorProps) {
  return (
    <CommentsProvider planId={props.plan.id} canWrite={props.comments.canWrite} members={props.comments.members} initialActiveId={props.comments.initialActiveId}>
      <PlanEditorBody {...props} />
    </CommentsProvider>
  );
}

function PlanEditorBody({ plan, editable, unitSystem, canEvaluate = editable, revisions, comments: commentSettings }: PlanEditorProps) {
  const comments = useComments();
  const [pinView, setPinView] = useState<PinView | null>(null);
  const onViewChange = useCallback((next: PinView) => setPinView({ scale: next.scale, offsetX: next.offsetX, offsetY: next.offsetY }), []);
  const [sideTab, setSideTab] = useState<'results' | 'comments'>(commentSettings.initialActiveId ? 'comments' : 'results');
  useEffect(() => { if (comments.placing || comments.activeId) setSideTab('comments'); }, [comments.placing, comments.activeId]);
  const [model, dispatch] = useReducer(editorReducer, plan, (initial) => initialModel(initial.document, initial.version, initial.metresPerPixel, editable));
  const [tool, setTool] = useState<ToolName>(editable && plan.document.segments.length === 0 ? 'draw' : editable ? 'select' : 'pan');
  const [helpOpen, setHelpOpen] = useState(false);
  const [calibrated, setCalibrated] = useState<[Point, Point] | null>(null);
  const [selectedOrder, setSelectedOrder] = useState<number | null>(null);
  const [canvasArea, canvasSize] = useElementSize<HTMLDivElement>();
  const modelRef = useRef(model);
  modelRef.current = model;

  const { reloadTheirs, overwriteWithMine } = useAutosave(plan.id, model, dispatch, editable);
  const [openRoomId, setOpenRoomId] = useState<string | null>(null);
  // The open room's noise path tables, on a sheet over the canvas; closed with the room.
  const [noiseSheetOpen, setNoiseSheetOpen] = useState(false);
  const [highlightPlace, setHighlightPlace] = useState<{ segmentId: string | null; nodeId: string | null } | null>(null);
  useEffect(() => setNoiseSheetOpen(false), [openRoomId]);
  const closeNoiseSheet = useCallback(() => setNoiseSheetOpen(false), []);
  const grid = useMemo(() => planGrid(model.metresPerPixel, unitSystem, model.history.present.gridOrigin), [model.metresPerPixel, unitSystem, model.history.present.gridOrigin]);
  const gridRef = useRef<PlanGrid>(grid);
  gridRef.current = grid;
  const tools = useCanvasTools(model, dispatch, tool, grid, setCalibrated, setOpenRoomId);
  const results = usePlanResults(plan.id, model.version);
  const risks = usePlanRisks(plan.id, model.version);
  const roomActions = useRoomActions(model, dispatch, setOpenRoomId);
  const doc = model.history.present;
  const labels = useMemo(() => planLabels(doc), [doc]);
  const formatPosition = useCallback((metres: number) => formatLength(metres, unitSystem, 'run'), [unitSystem]);

  const activeRunId = model.state.activeRunId ?? doc.runs[0]?.id ?? null;
  const activeResult = results.data?.runs.find((run) => run.runId === activeRunId) ?? results.data?.runs[0] ?? null;
  const listed = activeResult?.analysis?.resonances.find((candidate) => candidate.order === selectedOrder) ?? null;
  const envelope = useModeEnvelope(plan.id, results.data?.version ?? null, activeResult?.runId ?? null, listed ? listed.order : null);
  // The overlay draws from the nodes and antinodes until the engine's envelope of this resonance arrives.
  const resonance = useMemo(() => (listed && envelope.data ? { ...listed, pressureEnvelope: envelope.data } : listed), [listed, envelope.data]);
  useEffect(() => setSelectedOrder(null), [activeRunId]);

  // A tool that would change the plan is refused, with the reason, when the person may only read it.
  const chooseTool = useCallback((next: ToolName) => {
    if (!mayUseTool(next, modelRef.current.editable)) { dispatch({ type: 'notice', message: editRefusal(modelRef.current) }); return; }
    tools.cancel();
    setTool(next);
  }, [tools]);
  useEditorKeys({ modelRef, dispatch, chooseTool, cancelTool: tools.cancel, setHelpOpen });

  const onNodeDrag = useCallback((nodeId: string, point: Point, phase: 'move' | 'end') => {
    if (phase !== 'end') return;
    const current = modelRef.current;
    runCommand(current, dispatch, 'move-node', { nodeId, to: snapToGrid(point, gridRef.current.spacingPx, gridRef.current.origin), metresPerPixel: current.metresPerPixel });
  }, []);

  // A dragged room's corner lands on the grid, as a dragged point does; a drag back to where it was changes nothing.
  const onRoomDrag = useCallback((roomId: string, corner: Point) => {
    const current = modelRef.current;
    const to = snapToGrid(corner, gridRef.current.spacingPx, gridRef.current.origin);
    const room = findRoom(current.history.present, roomId);
    if (room && room.x === to.x && room.y === to.y) return;
    runCommand(current, dispatch, 'move-room', { roomId, to, metresPerPixel: current.metresPerPixel });
  }, []);

  const selection = model.state.selection;
  const selectedSegment = selection.segmentIds.length === 1 && selection.nodeIds.length === 0 ? findSegment(doc, selection.segmentIds[0]) : undefined;
  const selectedNode = selection.nodeIds.length === 1 && selection.segmentIds.length === 0 ? findNode(doc, selection.nodeIds[0]) : undefined;
  const nodeRun = selectedNode ? runOfNode(doc, selectedNode.id) : null;
  const nodeTermination = selectedNode && nodeRun ? nodeRun.terminations[selectedNode.id] : undefined;
  const panelRun = (selectedSegment && runOfSegment(doc, selectedSegment.id)) || nodeRun || (activeRunId ? findRun(doc, activeRunId) ?? null : null);

  const drawing = useMemo(() => planBackgroundOf(plan.background), [plan.background]);
  const dxf = useDxfDrawing(drawing?.kind === 'dxf' ? drawing.url : null);
  const layers = useHiddenLayers(plan.id, drawing?.kind === 'dxf' ? drawing.url : null, dxf.drawing);
  const background = useMemo(() => (drawing ? { ...drawing, hiddenLayers: layers.hidden } : null), [drawing, layers.hidden]);
  // A DXF whose units are stated sets the scale from the file (one undo step, saved like a scale set by hand).
  const onUploaded = useCallback((upload: { dxf?: { metresPerPixel: number | null } }) => {
    const metresPerPixel = upload.dxf?.metresPerPixel;
    if (metresPerPixel && metresPerPixel !== modelRef.current.metresPerPixel) dispatch({ type: 'set-scale', metresPerPixel });
  }, []);

  const openRoom = openRoomId ? doc.rooms.find((room) => room.id === openRoomId) ?? null : null;
  const openRoomResult = risks.data?.rooms.find((room) => room.roomId === openRoomId) ?? null;
  const openRoomNoise = useMemo(() => (openRoomResult?.noise ? noiseTables(openRoomResult.noise) : null), [openRoomResult?.noise]);
  const openRoomFlags = useMemo(() => (risks.data?.flags ?? []).filter((flag) => flag.roomId === openRoomId), [risks.data, openRoomId]);
  const flaggedRoomIds = useMemo(() => new Set((risks.data?.flags ?? []).map((flag) => flag.roomId).filter((roomId): roomId is string => roomId !== null)), [risks.data]);
  const risksStale = model.saveStatus !== 'saved' || (risks.data !== undefined && risks.data.version !== model.version) || risks.isFetching;
  const stale = model.saveStatus !== 'saved' || (results.data !== undefined && results.data.version !== model.version) || results.isFetching;
  const activeTool = TOOLS.find((candidate) => candidate.name === tool) ?? TOOLS[0];
  const tool_hint = { select: editable ? 'Click to select; drag points or rooms to move them.' : 'Click a segment or room to read it.', draw: 'Click at the fan end, then at each bend. Double-click or Escape ends the run.', split: 'Click a segment where it should split.', tee: 'Click a segment where the tee goes, then where its branch ends.', room: 'Click one corner of the room, then the opposite corner.', pan: 'Drag to pan; the wheel zooms.', scale: 'Click two points whose real distance you know; the grid starts at the first.', origin: 'Click where the grid should start.' }[tool];

  return (
    <div className="flex h-full flex-col">
      <div className="flex flex-nowrap items-center gap-x-2 border-b border-graphite-100 bg-paper px-4 py-2" data-testid="plan-header">
        <nav aria-label="Breadcrumb" className="min-w-0 max-w-[22rem] shrink truncate text-sm text-graphite-500" title={`${plan.project.name} / ${plan.name}`}>
          <span className="hidden xl:inline"><Link href={`/projects/${plan.project.id}`} className="hover:text-graphite">{plan.project.name}</Link> <span aria-hidden="true">/</span>{' '}</span>
          <h1 className="inline font-semibold text-graphite">{plan.name}</h1>
        </nav>
        {editable ? <SaveStatusLabel status={model.saveStatus} version={model.version} /> : <span className="rounded bg-paper-sunk px-2 py-0.5 text-xs">Read only</span>}
        <PlanRevisionActions planId={plan.id} latest={revisions.latest} planVersion={model.version} contentHash={model.saveStatus === 'saved' && results.data?.version === model.version ? results.data.contentHash : null} canSubmit={revisions.canSubmit && model.saveStatus === 'saved'} canIssue={revisions.canIssue} />
        <div className="ml-auto flex shrink-0 items-center gap-2">
          {editable && (
            <>
              <button type="button" className="btn-quiet whitespace-nowrap" onClick={() => dispatch({ type: 'undo' })} disabled={model.history.past.length === 0} title="Undo (Ctrl+Z)" aria-label="Undo"><span aria-hidden="true" className="xl:hidden">↶</span><span aria-hidden="true" className="hidden xl:inline">Undo</span></button>
              <button type="button" className="btn-quiet whitespace-nowrap" onClick={() => dispatch({ type: 'redo' })} disabled={model.history.future.length === 0} title="Redo (Ctrl+Shift+Z)" aria-label="Redo"><span aria-hidden="true" className="xl:hidden">↷</span><span aria-hidden="true" className="hidden xl:inline">Redo</span></button>
              <BackgroundUpload planId={plan.id} backgroundId={plan.background?.id ?? null} onUploaded={onUploaded} />
            </>
          )}
          <UnitSystemToggle unitSystem={unitSystem} />
          <button type="button" className="btn-quiet" onClick={() => setHelpOpen(true)} aria-label="Keyboard shortcuts">?</button>
        </div>
      </div>
      <div className="flex min-h-0 flex-1">
        <ToolStrip tool={tool} editable={model.editable} onTool={chooseTool} />
        <div className="relative min-w-0 flex-1 bg-paper-sunk" ref={canvasArea} data-testid="plan-canvas">
          {canvasSize.width > 0 && (
            <PlanCanvas
              highlight={noiseSheetOpen ? highlightPlace : null}
              document={doc}
              widthPx={canvasSize.width}
              heightPx={canvasSize.height}
              background={background}
              grid={grid}
              metresPerPixel={model.metresPerPixel}
              unitSystem={unitSystem}
              selection={selection}
              editable={model.editable && tool === 'select'}
              panning={tool === 'pan' && !comments.placing}
              mainPath={activeResult?.path ?? []}
              mode={resonance && activeResult?.analysis ? { resonance, speedOfSoundMps: activeResult.analysis.speedOfSoundMps } : null}
              preview={tools.feedback.preview}
              roomPreview={tools.feedback.roomPreview}
              selectedRoomId={openRoomId}
              flaggedRoomIds={flaggedRoomIds}
              calibration={tools.feedback.calibration}
              onPointer={(pointer) => { if (comments.placing && pointer.type === 'down') comments.placeAt(pointer.point.x, pointer.point.y); else tools.onPointer(pointer); }}
              onNodeDrag={onNodeDrag}
              onRoomDrag={onRoomDrag}
              onViewChange={onViewChange}
            />
          )}
          <CommentPins view={pinView} />
          <div className="pointer-events-none absolute inset-x-2 bottom-2 flex items-end justify-between gap-2 text-xs text-graphite-700">
            <p className="min-w-0 rounded bg-paper-raised/90 px-2 py-1" data-testid="active-tool">
              {comments.placing ? 'Click the plan where the comment belongs.' : <><span className="font-semibold text-select">{activeTool.label} ({activeTool.keys})</span> · {tool_hint}</>}
            </p>
            <p className="num shrink-0 rounded bg-paper-raised/90 px-2 py-1" title="Plan scale" data-testid="plan-scale">
              Scale 1 px = {formatLength(model.metresPerPixel, unitSystem, 'section')} · grid {gridStepWords(unitSystem)}{doc.gridOrigin ? ' from its origin' : ''}
            </p>
          </div>
          {model.notice && model.saveStatus !== 'conflict' && (
            <p role="alert" className="absolute left-1/2 top-2 -translate-x-1/2 rounded border border-risk bg-risk-soft px-3 py-1 text-sm text-risk-ink">
              {model.notice} <button type="button" className="ml-2 underline" onClick={() => dispatch({ type: 'notice', message: null })}>Dismiss</button>
            </p>
          )}
          {calibrated && (
            <ScaleDialog points={calibrated} unitSystem={unitSystem}
              onApply={(metresPerPixel) => { dispatch({ type: 'set-scale', metresPerPixel, gridOrigin: calibrated[0] }); setCalibrated(null); tools.clearCalibration(); chooseTool('select'); }}
              onCancel={() => { setCalibrated(null); tools.clearCalibration(); }} />
          )}
          {model.saveStatus === 'conflict' && <ConflictDialog message={model.notice ?? ''} onReload={reloadTheirs} onOverwrite={overwriteWithMine} />}
          {helpOpen && <HelpOverlay onClose={() => setHelpOpen(false)} />}
          {openRoom && noiseSheetOpen && openRoomNoise && <NoiseSheet planName={plan.name} roomName={openRoom.name} tables={openRoomNoise} unitSystem={unitSystem} onClose={closeNoiseSheet} onPlace={setHighlightPlace} />}
        </div>
        <aside className="w-[25rem] shrink-0 overflow-y-auto border-l border-graphite-100 bg-paper-raised p-4" aria-label={selectedSegment || selectedNode || openRoom ? 'Properties' : 'Results'}>
          {openRoom ? (
            <RoomPanel key={openRoom.id} document={doc} metresPerPixel={model.metresPerPixel} room={openRoom} result={risks.data?.rooms.find((room) => room.roomId === openRoom.id) ?? null}
              flags={openRoomFlags} unitSystem={unitSystem} editable={editable} onShowNoiseTables={() => setNoiseSheetOpen(true)}
              onChange={(changes) => roomActions.updateRoom(openRoom.id, changes)} onDelete={() => roomActions.deleteRoom(openRoom.id)} onClose={() => setOpenRoomId(null)} />
          ) : selectedSegment ? (
            <SegmentPanel key={selectedSegment.id} document={doc} segment={selectedSegment} label={labels.segments[selectedSegment.id] ?? ''} metresPerPixel={model.metresPerPixel} unitSystem={unitSystem} editable={editable}
              onSection={(section) => runCommand(model, dispatch, 'set-section', { section })}
              onLining={(lining) => runCommand(model, dispatch, 'set-lining', { lining })}
              onWall={(wall) => runCommand(model, dispatch, 'set-wall', { wall })}
              runWallsWords={wallWords(runOfSegment(doc, selectedSegment.id)?.walls ?? null)}
              onLengthOverride={(lengthM) => runCommand(model, dispatch, 'set-length-override', { lengthM })}
              onInserts={(inserts) => runCommand(model, dispatch, 'set-inserts', { inserts })} />
          ) : selectedNode && nodeRun && nodeTermination ? (
            <EndPanel key={selectedNode.id} run={nodeRun} nodeId={selectedNode.id} label={labels.nodes[selectedNode.id] ?? ''} termination={nodeTermination} editable={editable}
              isChosenEnd={activeResult?.path.at(-1)?.toNodeId === selectedNode.id}
              onTermination={(termination) => runCommand(model, dispatch, 'set-termination', { nodeId: selectedNode.id, termination })}
              onChooseEnd={() => runCommand(model, dispatch, 'choose-end', { runId: nodeRun.id, nodeId: selectedNode.id })} />
          ) : (
            <div className="space-y-6">
              <div role="tablist" aria-label="Side panel" className="flex gap-1 border-b border-graphite-100">
                {(['results', 'comments'] as const).map((tab) => (
                  <button key={tab} type="button" role="tab" aria-selected={sideTab === tab} onClick={() => setSideTab(tab)}
                    className={`-mb-px border-b-2 px-3 py-1.5 text-sm ${sideTab === tab ? 'border-select font-medium text-graphite' : 'border-transparent text-graphite-500 hover:text-graphite'}`}>
                    {tab === 'results' ? 'Results' : `Comments${comments.threads.length ? ` (${comments.threads.filter((thread) => !thread.resolved).length} open)` : ''}`}
                  </button>
                ))}
              </div>
              {sideTab === 'comments' ? <CommentsPanel place={{ document: doc, metresPerPixel: model.metresPerPixel, unitSystem, labels }} /> : (<>
              {dxf.drawing && <DrawingLayersPanel drawing={dxf.drawing} hidden={layers.hidden} onToggle={layers.toggle} />}
              {dxf.error && <p role="alert" className="text-sm text-risk-ink">{dxf.error}</p>}
              {doc.runs.length > 1 && (
                <div>
                  <label htmlFor="run-picker" className="block text-xs font-medium text-graphite-700">Results for</label>
                  <select id="run-picker" className="field-input mt-0.5 py-1" value={activeRunId ?? ''} onChange={(event) => dispatch({ type: 'set-state', state: { ...model.state, activeRunId: event.target.value } })}>
                    {doc.runs.map((run) => <option key={run.id} value={run.id}>{run.name}</option>)}
                  </select>
                </div>
              )}
              <ScheduleCsvControls document={doc} runId={activeRunId} runName={(activeRunId && findRun(doc, activeRunId)?.name) || 'run'} metresPerPixel={model.metresPerPixel} editable={editable}
                onApply={(document) => dispatch({ type: 'apply', document, state: normalizeState(document, model.state) })} />
              <ResultsPanel result={activeResult} loading={results.isLoading} stale={stale} error={results.error ? results.error.message : null}
                selectedOrder={selectedOrder} onSelectOrder={setSelectedOrder} formatPosition={formatPosition} nodeLabels={labels.nodes} unitSystem={unitSystem} planName={plan.name} />
              {activeRunId && <div className="mt-5"><OutletReflectionLossTable document={doc} runId={activeRunId} labels={labels} unitSystem={unitSystem} planName={plan.name} /></div>}
              </>)}
            </div>
          )}
          {panelRun && !openRoom && (selectedSegment || selectedNode || editable) && (
            <div className="mt-6 border-t border-graphite-100 pt-4">
              <RunPanel run={panelRun} editable={editable} unitSystem={unitSystem} fanOwners={doc.runs.filter((other) => other.id !== panelRun.id && other.fanOfRunId == null && !doc.runs.some((sharer) => sharer.fanOfRunId === panelRun.id))} onChange={(changes) => runCommand(model, dispatch, 'set-run-properties', { runId: panelRun.id, ...changes })}
                onRenumber={editable ? () => runCommand(model, dispatch, 'renumber-run', { runId: panelRun.id }) : undefined} />
            </div>
          )}
        </aside>
      </div>
      <RiskDrawer planId={plan.id} version={model.version} flags={risks.data?.flags ?? null} rules={risks.data ?? null} roomResults={risks.data?.rooms ?? []} rooms={doc.rooms} treatments={doc.treatments ?? []}
        treatmentChecks={risks.data && risks.data.version === model.version ? risks.data.treatmentChecks : null} document={doc}
        loading={risks.isLoading} stale={risksStale} error={risks.error ? risks.error.message : null} editable={editable} canEvaluate={canEvaluate}
        onOpenRoom={setOpenRoomId} onAddRoom={roomActions.addRoom} onChoose={roomActions.chooseTreatment} onRemoveTreatment={roomActions.removeTreatment} />
    </div>
  );
}
