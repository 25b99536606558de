/** A force in newtons shown in kN to two decimals, the way the bench's results are compared. */
export const kN = (newtons: number) => `${(newtons / 1000).toFixed(2)} kN`;
