import type { ComputedRef, Ref } from 'vue'
import type { NodeInput, SpringInput } from '@shared/schemas/model'
import type { ModelDefinition } from '@shared/schemas/sizing'
import type { SizingDraft, SizingForm } from './draft'
import * as structure from './structure-edits'
import * as units from './unit-edits'
import { patch } from './patch'
import type { SizingUnit } from '@shared/schemas/sizing-units'

/**
 * The named edits of the draft being worked on. Each marks it unsaved; none runs on a read-only
 * sizing (handed over, or opened by sales).
 */
export function draftActions(current: ComputedRef<SizingDraft | undefined>, locked: Ref<boolean>) {
  function edit(change: (d: SizingDraft) => void) {
    const d = current.value
    if (!d || locked.value) return
    change(d)
    d.changed = true
    d.updatedAt = new Date().toISOString()
  }
  /** A change of the structure: it now differs from the saved model revision. */
  function editStructure(change: (def: ModelDefinition) => void) {
    edit((d) => {
      change(d.definition)
      d.structureChanged = true
    })
  }

  return {
    /** Sets choices of the form; a choice given as undefined is removed (the band, say). */
    setChoices(change: Partial<SizingForm>) {
      edit((d) => patch(d.form, change))
    },
    /** Attaches the absorber at a node; empty excitation and response nodes follow it. */
    attachAt(id: string) {
      edit((d) => {
        d.form.absorberNode = id
        if (!d.form.excitationNode) d.form.excitationNode = id
        if (!d.form.responseNode) d.form.responseNode = id
      })
    },
    /** Replaces nodes that no longer exist (or are unset) by `id`, and a target mode out of range. */
    keepNodeChoices(id: string, nodeIds: Set<string>, modeCount: number) {
      edit((d) => {
        if (d.form.targetMode > modeCount) d.form.targetMode = 1
        for (const key of ['absorberNode', 'excitationNode', 'responseNode'] as const)
          if (!d.form[key] || !nodeIds.has(d.form[key])) d.form[key] = id
      })
    },
    /** Adds a further absorber (see unit-edits.ts). */
    addUnit: (modeCount: number) => edit((d) => units.addUnit(d.form, modeCount)),
    setUnit: (index: number, change: Partial<SizingUnit>) =>
      edit((d) => units.setUnit(d.form, index, change)),
    removeUnit: (index: number) => edit((d) => units.removeUnit(d.form, index)),
    setModelName: (name: string) => edit((d) => (d.modelName = name)),
    setRevisionReason: (reason: string) => edit((d) => (d.revisionReason = reason)),
    /** Moves onto a stored revision of the model (the engineer says so, never by itself). */
    moveToRevision(definition: ModelDefinition, revision: number) {
      edit((d) => {
        d.definition = definition
        d.modelRevision = revision
        d.structureChanged = false
        d.revisionReason = ''
      })
    },
    replaceStructure: (nodes: NodeInput[], springs: SpringInput[]) =>
      editStructure((def) => Object.assign(def, { nodes, springs })),
    setHostDamping: (value: number | number[]) =>
      editStructure((def) => (def.hostDampingRatio = value)),
    renameNode: (index: number, id: string) =>
      editStructure((def) => structure.renameNode(def, index, id)),
    /** Adds a node; returns its id ('' on a read-only sizing). */
    addNode() {
      let id = ''
      editStructure((def) => (id = structure.addNode(def)))
      return id
    },
    removeNode: (id: string) => editStructure((def) => structure.removeNode(def, id)),
    setNode: (index: number, change: Partial<NodeInput>) =>
      editStructure((def) => structure.setNode(def, index, change)),
    addSpring: () => editStructure((def) => structure.addSpring(def)),
    setSpring: (index: number, change: Partial<SpringInput>) =>
      editStructure((def) => structure.setSpring(def, index, change)),
    removeSpring: (index: number) => editStructure((def) => structure.removeSpring(def, index)),
  }
}
