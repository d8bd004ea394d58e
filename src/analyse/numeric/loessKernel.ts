import {LOESS_KERNEL_BASE64} from './loessKernelBinary.js';

/**
 * The compiled LOESS kernel (loessKernel.wat): one instance per thread, with its own memory.
 *
 * Callers lay out their arrays in the kernel's memory from {@link kernelHeap}, in f64 slots numbered from the heap
 * base, and hand the kernel byte addresses from {@link slotAddress}. Nothing is kept between calls but the tricube
 * tables, so callers may reuse the heap freely; the kernel never calls back, so calls cannot overlap.
 */
interface KernelExports {
  memory: {buffer: ArrayBuffer; grow(pages: number): number};
  heapBase: {value: number};
  setWideArea(address: number, capacity: number): void;
  loessInto(
    y: number, n: number, span: number, degree: number, jump: number, rw: number, plain: number, out: number,
  ): void;
  robustnessWeights(y: number, trend: number, seasonal: number, n: number, out: number, scratch: number): void;
  partialSort(a: number, n: number, ranks: number, count: number): void;
  innerPass(
    y: number, n: number, np: number, ns: number, nt: number, nl: number,
    sDegree: number, tDegree: number, lDegree: number, sJump: number, tJump: number, lJump: number,
    rw: number, plain: number, ones: number, seasonal: number, trend: number, work: number,
  ): void;
}

// Node's WebAssembly global, declared here as far as it is used: the project's type libraries do not declare it.
declare const WebAssembly: {
  Module: new (bytes: Uint8Array) => object;
  Instance: new (module: object) => {exports: object};
};

const instance = new WebAssembly.Instance(new WebAssembly.Module(Buffer.from(LOESS_KERNEL_BASE64, 'base64')));
export const kernel = instance.exports as unknown as KernelExports;
const heapBase = kernel.heapBase.value;
const PAGE = 65_536;
let view = new Float64Array(kernel.memory.buffer);

/** Byte address of heap slot `slot`. */
export function slotAddress(slot: number): number {
  return heapBase + 8 * slot;
}

/**
 * A view of the heap with at least `slots` f64 slots, growing the kernel's memory when needed; index 0 is the first
 * heap slot. Valid until the next call of this function.
 */
export function kernelHeap(slots: number): Float64Array {
  const bytes = heapBase + 8 * slots;
  const memory = kernel.memory;
  if (bytes > memory.buffer.byteLength) memory.grow(Math.ceil((bytes - memory.buffer.byteLength) / PAGE));
  if (view.buffer !== memory.buffer) view = new Float64Array(memory.buffer);
  return view.subarray(heapBase / 8);
}
