/**
 * The SI unit stored beside each parameter, the same for the demo seed and reviewers' submissions.
 * Q factors and η0 are plain ratios (empty unit); excursion limits are in metres.
 */
export const PARAMETER_UNITS: Readonly<Record<string, string>> = {
  fs: 'Hz', qms: '', qes: '', qts: '', re: 'ohm', le: 'H', mms: 'kg', mmd: 'kg', cms: 'm/N', kms: 'N/m', rms: 'kg/s', bl: 'T·m', sd: 'm^2',
  vas: 'm^3', xmax: 'm', spl283v: 'dB', spl1w: 'dB', eta0: '', ebp: 'Hz', vd: 'm^3',
  x_bl: 'm', x_c: 'm', x_l: 'm', xmax_ls: 'm', bl_offset: 'm', bl0: 'T·m', kms0: 'N/m',
};

export const parameterUnit = (name: string): string => PARAMETER_UNITS[name] ?? '';
