// ComplexScalar: a complex number re + i·im as a plain record.
export interface ComplexScalar {
  readonly re: number;
  readonly im: number;
}
