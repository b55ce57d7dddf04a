import type { ObservedState } from '@shared/states';

/**
 * How Gelwright draws each state: a colour and a distinct shape, so states stay apart in
 * greyscale and for colour-blind readers. Shapes name d3-shape symbol types.
 */
export const STATE_STYLE: Record<ObservedState, { colour: string; tint: string; shape: 'circle' | 'square' | 'triangle' | 'star' | 'wye' | 'diamond' | 'cross' }> = {
  fluid: { colour: '#3b74c4', tint: '#dce8f7', shape: 'circle' },
  gel: { colour: '#1c8a63', tint: '#d5eee4', shape: 'square' },
  glass: { colour: '#7d55b8', tint: '#e8def5', shape: 'triangle' },
  crystal: { colour: '#c27a1c', tint: '#f6e6cc', shape: 'star' },
  separated: { colour: '#bf3f48', tint: '#f6dadc', shape: 'wye' },
  collapsed: { colour: '#5d6670', tint: '#e3e5e8', shape: 'diamond' },
  unclear: { colour: '#8f969d', tint: '#eef0f1', shape: 'cross' },
};
